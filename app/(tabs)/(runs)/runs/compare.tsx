export { CompareScreen as default } from '@/components/screens/runs/compare-screen';
