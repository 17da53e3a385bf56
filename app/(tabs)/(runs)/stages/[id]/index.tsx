export { CoolerScreen as default } from '@/components/screens/stages/cooler-screen';
