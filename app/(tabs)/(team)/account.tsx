export { AccountScreen as default } from '@/components/screens/account/account-screen';
