export { NewModuleScreen as default } from '@/components/screens/modules/module-screen';
