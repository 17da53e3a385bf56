export { ForgotPasswordScreen as default } from '@/components/auth/forgot-password-screen';
