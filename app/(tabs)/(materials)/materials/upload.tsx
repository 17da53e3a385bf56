export { UploadFamilyScreen as default } from '@/components/screens/materials/upload/upload-family-screen';
