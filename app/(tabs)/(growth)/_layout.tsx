export { GrowthStack as default } from '@/components/screens/growth/growth-stack';
