export { GrowthOrdersScreen as default } from '@/components/screens/growth/growth-orders-screen';
