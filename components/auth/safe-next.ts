/**
 * Where to go after signing in: only a path of this app ("/team"), never
 * another site ("//evil.example", "https://…") or a signed-out page.
 */
export function safeNext(next: string | string[] | undefined): string {
  const value = Array.isArray(next) ? next[0] : next;
  if (!value || !value.startsWith('/') || value.startsWith('//') || value.includes('\\')) return '/';
  const signedOutPages = ['/sign-in', '/sign-up', '/forgot-password'];
  if (signedOutPages.some((page) => value === page || value.startsWith(`${page}?`))) return '/';
  return value;
}
