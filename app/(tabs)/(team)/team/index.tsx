export { TeamScreen as default } from '@/components/screens/team/team-screen';
