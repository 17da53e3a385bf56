import type { ReactNode } from 'react';
import { LoadingState } from '@/components/ui/state-views';
import { AuthFrame } from './auth-frame';
import { FormAlert } from './form/form-alert';
import { errorsFrom } from './form/form-errors';

export type LinkPageProps<T> = {
  /** The single-use token from the e-mailed link ('' when the page was opened without one). */
  token: string;
  /** The link's preview (`GET /api/…/:token`): 400 when invalid, used or expired. */
  preview: { data?: T; error: Error | null; isError: boolean };
  /** Page and alert titles while the link is unusable, what to do then, and the alert's test id. */
  unusable: { page: string; alert: string; hint: string; testID: string };
  loading: { page: string; label: string };
  footer: ReactNode;
  children: (data: T) => ReactNode;
};

/**
 * A page opened from an e-mailed link (invitation, sign-up): says plainly
 * when the link cannot be used and why, waits for its preview, then shows
 * what the link will make.
 */
export function LinkPage<T>({ token, preview, unusable, loading, footer, children }: LinkPageProps<T>) {
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
  return <>{children(preview.data)}</>;
}
