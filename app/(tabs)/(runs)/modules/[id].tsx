export { ModuleScreen as default } from '@/components/screens/modules/module-screen';
