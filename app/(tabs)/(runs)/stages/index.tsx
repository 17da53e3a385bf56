export { StagesScreen as default } from '@/components/screens/stages/stages-screen';
