export { AppShell as default } from '@/components/shell/app-shell';
