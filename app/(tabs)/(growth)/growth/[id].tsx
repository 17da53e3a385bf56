export { GrowthOrderScreen as default } from '@/components/screens/growth/growth-order-screen';
