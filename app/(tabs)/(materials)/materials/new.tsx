export { NewFamilyScreen as default } from '@/components/screens/materials/form/new-family-screen';
