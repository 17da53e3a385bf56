import { useState } from 'react';
import { Redirect, Slot, useGlobalSearchParams, type Href } from 'expo-router';
import { safeNext } from './safe-next';
import { useSession } from './session';

/** The `(auth)` layout: sign-in, sign-up, forgot password — for the signed out only. */
export function AuthLayout() {
  const session = useSession();
  // A layout's local params are its own; `next` belongs to the page's URL. Read it
  // once: the redirect itself changes the URL under us.
  const { next } = useGlobalSearchParams<{ next?: string }>();
  const [target] = useState(() => safeNext(next));
  if (session) return <Redirect href={target as Href} />;
  return <Slot />;
}
