export { RunScreen as default } from '@/components/screens/runs/run-screen';
