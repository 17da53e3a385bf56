export { AuditScreen as default } from '@/components/screens/team/audit-screen';
