export { CompareCascadesScreen as default } from '@/components/screens/stages/compare-cascades-screen';
