export { ModulesScreen as default } from '@/components/screens/modules/modules-screen';
