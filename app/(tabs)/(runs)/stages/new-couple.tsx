export { NewCoupleScreen as default } from '@/components/screens/stages/cooler-editor-screens';
