export { ResetPasswordScreen as default } from '@/components/auth/reset-password-screen';
