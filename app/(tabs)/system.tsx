export { SystemScreen as default } from '@/components/screens/system/system-screen';
