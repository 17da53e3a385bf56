export { AuthLayout as default } from '@/components/auth/auth-layout';
