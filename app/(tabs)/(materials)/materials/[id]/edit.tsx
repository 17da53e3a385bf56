export { EditFamilyScreen as default } from '@/components/screens/materials/form/edit-family-screen';
