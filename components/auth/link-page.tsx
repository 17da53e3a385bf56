import { useState, type ReactNode } from 'react';
import { useLocalSearchParams } from 'expo-router';
import { LoadingState } from '@/components/ui/state-views';
import { AuthFrame } from './auth-frame';
import { FormAlert } from './form/form-alert';
import { errorsFrom } from './form/form-errors';
import { useSession } from './session';
import { SignedInElsewhere } from './signed-in-elsewhere';

export type LinkPageProps<T> = {
  /** The link's preview (`GET /api/…/:token`): 400 when invalid, used or expired. Called as a hook. */
  usePreview: (token: string) => { data?: T; error: Error | null; isError: boolean };
  /** Page and alert titles while the link is unusable, what to do then, and the alert's test id. */
  unusable: { page: string; alert: string; hint: string; testID: string };
  loading: { page: string; label: string };
  /** Title, subtitle and summary of what the link will make, once its preview is in. */
  ready: (data: T) => { title: string; subtitle: string; summary: ReactNode };
  /** The form that spends the link. */
  form: (token: string) => ReactNode;
  /** Someone already signed in is asked to sign out first: how the link is named then, and that note's test id. */
  signedIn: { what: string; testID: string };
  footer: ReactNode;
};

/**
 * A page opened from an e-mailed link that makes an account (invitation,
 * sign-up): says plainly when the link cannot be used and why, waits for its
 * preview, shows what it will make, then its form — or, to someone already
 * signed in when the page opened, a request to sign out first.
 */
export function LinkPage<T>({ usePreview, unusable, loading, ready, form, signedIn, footer }: LinkPageProps<T>) {
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const session = useSession();
  // Once this page has made the account, the session belongs to it: no "signed in elsewhere".
  const [startedSignedIn] = useState(session !== null);
  const preview = usePreview(token);
  if (!token || preview.isError) {
    return (
      <AuthFrame title={unusable.page} footer={footer}>
        <FormAlert tone="danger" title={unusable.alert} testID={unusable.testID}>
          {preview.error ? errorsFrom(preview.error, []).banner : unusable.hint}
        </FormAlert>
      </AuthFrame>
    );
  }
  if (!preview.data) {
    return (
      <AuthFrame title={loading.page}>
        <LoadingState label={loading.label} />
      </AuthFrame>
    );
  }
  const shown = ready(preview.data);
  return (
    <AuthFrame title={shown.title} subtitle={shown.subtitle} footer={footer}>
      {shown.summary}
      {startedSignedIn && session ? <SignedInElsewhere session={session} what={signedIn.what} testID={signedIn.testID} /> : form(token)}
    </AuthFrame>
  );
}
