export { OutboxScreen as default } from '@/components/screens/outbox/outbox-screen';
