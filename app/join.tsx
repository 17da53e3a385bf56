export { JoinScreen as default } from '@/components/auth/join-screen';
