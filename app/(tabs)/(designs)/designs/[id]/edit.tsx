export { EditDesignScreen as default } from '@/components/screens/designs/edit-design-screen';
