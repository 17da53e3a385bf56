import { resetRequestSchema } from '@/shared/api/auth';
import { useRequestReset } from '@/components/api/auth';
import { AuthFrame } from './auth-frame';
import { AuthLink } from './auth-link';
import { AccountField } from './form/account-field';
import { FormAlert, FormProblem } from './form/form-alert';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';

const fields = ['email'] as const;

/**
 * The same words whether or not the address has an account, so this page
 * never tells anyone who uses Frostgrade.
 */
export const resetRequestedText =
  'If a Frostgrade account uses this address, an e-mail with a link to choose a new password is on its way. The link works once, within one hour.';

/** `/forgot-password`: asks for a reset link by e-mail. */
export function ForgotPasswordScreen() {
  const form = useAccountForm(fields, { email: '' });
  const request = useRequestReset();
  const submit = () => {
    if (request.isPending || !form.check(resetRequestSchema)) return;
    request.mutate(form.values.email, { onError: form.fail });
  };
  return (
    <AuthFrame
      title="Forgot your password?"
      subtitle="Tell us the address you sign in with; we e-mail it a link to choose a new password."
      footer={<AuthLink lead="Remembered it?" label="Sign in" href="/sign-in" />}
    >
      {request.isSuccess ? (
        <FormAlert tone="ok" title="Check your e-mail" testID="reset-requested">
          {resetRequestedText}
        </FormAlert>
      ) : null}
      <FormProblem title="No link sent" problem={form.errors.banner} />
      <AccountField {...form.field('email')} label="E-mail" kind="email" onSubmit={submit} />
      <SubmitButton
        label={request.isSuccess ? 'Send another link' : 'Send reset link'}
        busyLabel="Sending…"
        busy={request.isPending}
        onPress={submit}
        testID="submit-reset-request"
      />
    </AuthFrame>
  );
}
