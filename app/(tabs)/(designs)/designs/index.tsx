export { DesignsScreen as default } from '@/components/screens/designs/designs-screen';
