export { SignUpScreen as default } from '@/components/auth/sign-up-screen';
