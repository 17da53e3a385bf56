export { NewCascadeScreen as default } from '@/components/screens/stages/cooler-editor-screens';
