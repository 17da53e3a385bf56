export { SectionStack as default } from '@/components/screens/runs/section-stack';
