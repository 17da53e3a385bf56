export { SignedInShell as default } from '@/components/auth/signed-in-shell';
