export { FamilyDetailScreen as default } from '@/components/screens/materials/detail/family-detail-screen';
