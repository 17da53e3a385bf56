export { ConfirmSignUpScreen as default } from '@/components/auth/confirm-sign-up-screen';
