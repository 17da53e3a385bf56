export { NotFoundScreen as default } from '@/components/screens/not-found-screen';
