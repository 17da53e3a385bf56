import { router } from 'expo-router';
import { signUpConfirmSchema, type SignUpPreview } from '@/shared/api/auth';
import { useConfirmSignUp, useSignUpPreview } from '@/components/api/auth';
import { formatDay } from '@/components/format/date';
import { AppText } from '@/components/ui/text';
import { AuthLink } from './auth-link';
import { AccountField, newPasswordHelp } from './form/account-field';
import { FormProblem } from './form/form-alert';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';
import { SummaryCard, SummaryLine } from './invitation-summary';
import { LinkPage } from './link-page';

const fields = ['password'] as const;

function SignUpSummary({ preview }: { preview: SignUpPreview }) {
  return (
    <SummaryCard testID="sign-up-summary">
      <SummaryLine label="Team">
        <AppText variant="bodyStrong">{preview.teamName}</AppText>
      </SummaryLine>
      <SummaryLine label="You">
        <AppText>{`${preview.displayName}, admin`}</AppText>
      </SummaryLine>
      <SummaryLine label="E-mail">
        <AppText>{preview.email}</AppText>
      </SummaryLine>
      <SummaryLine label="Link valid until">
        <AppText>{formatDay(preview.expiresAt)}</AppText>
      </SummaryLine>
    </SummaryCard>
  );
}

function PasswordForm({ token }: { token: string }) {
  const form = useAccountForm(fields, { password: '' });
  const confirm = useConfirmSignUp();
  const submit = () => {
    if (confirm.isPending || !form.check(signUpConfirmSchema, { token })) return;
    confirm.mutate({ token, password: form.values.password }, { onError: form.fail, onSuccess: () => router.replace('/') });
  };
  return (
    <>
      <FormProblem title="Team not created" problem={form.errors.banner} testID="confirm-problem" />
      <AccountField {...form.field('password')} label="Choose a password" kind="new-password" help={newPasswordHelp} onSubmit={submit} />
      <SubmitButton label="Create team and account" busyLabel="Creating…" busy={confirm.isPending} onPress={submit} testID="submit-confirm-sign-up" />
    </>
  );
}

/** `/confirm-sign-up?token=…`: sign-up, step two, from the e-mailed link: the password makes the team and signs in. */
export function ConfirmSignUpScreen() {
  return (
    <LinkPage
      usePreview={useSignUpPreview}
      unusable={{
        page: 'Sign-up link not usable',
        alert: 'This link does not finish a sign-up',
        hint: 'Open the link from your sign-up e-mail as it is, or sign up again for a new one.',
        testID: 'confirm-unusable',
      }}
      loading={{ page: 'Finish creating your team', label: 'Opening the link…' }}
      ready={(signUp) => ({
        title: 'Choose your password',
        subtitle: 'Last step: this creates your team with you as its admin, and signs you in.',
        summary: <SignUpSummary preview={signUp} />,
      })}
      form={(token) => <PasswordForm token={token} />}
      signedIn={{ what: 'This sign-up link', testID: 'confirm-signed-in' }}
      footer={<AuthLink lead="Link expired or used?" label="Sign up again" href="/sign-up" />}
    />
  );
}
