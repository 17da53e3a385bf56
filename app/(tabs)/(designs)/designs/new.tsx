export { NewDesignScreen as default } from '@/components/screens/designs/new-design-screen';
