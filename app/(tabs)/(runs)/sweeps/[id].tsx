export { SweepScreen as default } from '@/components/screens/runs/sweep-screen';
