export { RunsScreen as default } from '@/components/screens/runs/runs-screen';
