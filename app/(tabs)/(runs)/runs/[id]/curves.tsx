export { RunCurvesScreen as default } from '@/components/screens/curves/run-curves-screen';
