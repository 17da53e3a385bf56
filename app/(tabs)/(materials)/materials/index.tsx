export { MaterialsScreen as default } from '@/components/screens/materials/materials-screen';
