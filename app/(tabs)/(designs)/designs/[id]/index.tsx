export { DesignDetailScreen as default } from '@/components/screens/designs/design-detail-screen';
