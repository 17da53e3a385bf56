import { useEffect, useState } from 'react';
import { Redirect, usePathname } from 'expo-router';
import { AppShell } from '@/components/shell/app-shell';
import { homeFor } from '@/components/shell/home';
import { useSession } from './session';

/**
 * The `(tabs)` layout: the shell for a signed-in member, the sign-in page
 * for anyone else. Someone who opened a deep link signed out comes back to
 * it after signing in; someone who signs out (or whose session ends)
 * starts from the home page next time.
 */
export function SignedInShell() {
  const session = useSession();
  const pathname = usePathname();
  // The address first asked for: the redirect itself changes the pathname under us.
  const [entryPath] = useState(pathname);
  const [wasSignedIn, setWasSignedIn] = useState(false);
  useEffect(() => {
    if (session) setWasSignedIn(true);
  }, [session]);
  if (session) {
    // "/" is each role's start page: a grower's is her growth orders.
    const home = homeFor(session.user.role);
    if (pathname === '/' && home !== '/') return <Redirect href={home} />;
    return <AppShell />;
  }
  const keepPath = !wasSignedIn && entryPath !== '/';
  return <Redirect href={keepPath ? { pathname: '/sign-in', params: { next: entryPath } } : '/sign-in'} />;
}
