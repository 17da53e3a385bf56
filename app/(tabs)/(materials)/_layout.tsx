export { MaterialsStack as default } from '@/components/shell/materials-stack';
