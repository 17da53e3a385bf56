import { useLocalSearchParams } from 'expo-router';
import { resetConfirmSchema } from '@/shared/api/auth';
import { useResetPassword } from '@/components/api/auth';
import { AuthFrame } from './auth-frame';
import { AuthLink } from './auth-link';
import { AccountField, newPasswordHelp } from './form/account-field';
import { FormAlert, FormProblem } from './form/form-alert';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';

const fields = ['password'] as const;

function Done() {
  return (
    <AuthFrame title="Password changed" footer={<AuthLink label="Sign in with the new password" href="/sign-in" testID="link-sign-in" />}>
      <FormAlert tone="ok" title="Your new password is set" testID="reset-done">
        Every session of this account has been signed out, on every device, and a note of the change went to its
        e-mail address.
      </FormAlert>
    </AuthFrame>
  );
}

function MissingToken() {
  return (
    <AuthFrame title="Choose a new password" footer={<AuthLink label="Ask for a reset link" href="/forgot-password" />}>
      <FormAlert tone="danger" title="This page needs the link from the e-mail">
        Open the reset link from your e-mail as it is; it carries a single-use key.
      </FormAlert>
    </AuthFrame>
  );
}

/** `/reset-password?token=…`: the link from the reset e-mail. Works signed in or out. */
export function ResetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const form = useAccountForm(fields, { password: '' });
  const reset = useResetPassword();
  if (!token) return <MissingToken />;
  if (reset.isSuccess) return <Done />;
  const submit = () => {
    if (reset.isPending || !form.check(resetConfirmSchema, { token })) return;
    reset.mutate({ token, password: form.values.password }, { onError: form.fail });
  };
  return (
    <AuthFrame
      title="Choose a new password"
      subtitle="It replaces the old one at once, and signs the account out everywhere."
      footer={<AuthLink lead="Link expired or used?" label="Ask for a new one" href="/forgot-password" />}
    >
      <FormProblem title="Password not changed" problem={form.errors.banner} testID="reset-problem" />
      <AccountField
        {...form.field('password')}
        label="New password"
        kind="new-password"
        help={newPasswordHelp}
        onSubmit={submit}
      />
      <SubmitButton label="Set new password" busyLabel="Saving…" busy={reset.isPending} onPress={submit} testID="submit-reset" />
    </AuthFrame>
  );
}
