import { StyleSheet, View } from 'react-native';
import { signUpRequestSchema } from '@/shared/api/auth';
import { useRequestSignUp } from '@/components/api/auth';
import { spacing } from '@/components/theme';
import { RowButton } from '@/components/ui/row-button';
import { AuthFrame } from './auth-frame';
import { AuthLink } from './auth-link';
import { AccountField } from './form/account-field';
import { FormAlert, FormProblem } from './form/form-alert';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';

const fields = ['displayName', 'email', 'teamName'] as const;

/**
 * The same words for every address (the API answers alike): the mailbox's
 * owner learns from the e-mail whether a link or a note about an existing
 * account came, nobody else does.
 */
function CheckInbox({ email, onAgain }: { email: string; onAgain: () => void }) {
  return (
    <AuthFrame
      title="Check your inbox"
      subtitle="One more step: choose your password from the link we e-mailed."
      footer={<AuthLink lead="Have an account?" label="Sign in" href="/sign-in" testID="link-sign-in" />}
    >
      <FormAlert tone="ok" title={`We sent an e-mail to ${email}`} testID="sign-up-requested">
        Open the link in it to choose your password; that creates your team and signs you in. The link works once, for
        24 hours. If this address already has an account, the e-mail says how to sign in instead.
      </FormAlert>
      <View style={styles.row}>
        <RowButton label="Use another address" onPress={onAgain} testID="sign-up-again" />
      </View>
    </AuthFrame>
  );
}

/** `/sign-up`, step one: a new team, whose first member (you) is its admin; the password comes with the e-mailed link. */
export function SignUpScreen() {
  const form = useAccountForm(fields, { displayName: '', email: '', teamName: '' });
  const request = useRequestSignUp();
  const submit = () => {
    if (request.isPending || !form.check(signUpRequestSchema)) return;
    request.mutate(form.values, { onError: form.fail });
  };
  if (request.isSuccess) return <CheckInbox email={request.variables.email.trim()} onAgain={() => request.reset()} />;
  return (
    <AuthFrame
      title="Start a team"
      subtitle="You become its admin and invite physicists, growers and viewers. Joining an existing team? Use the link in your invitation e-mail instead."
      footer={<AuthLink lead="Have an account?" label="Sign in" href="/sign-in" testID="link-sign-in" />}
    >
      <FormProblem title="Team not started" problem={form.errors.banner} />
      <View style={styles.fields}>
        <AccountField {...form.field('displayName')} label="Your name" kind="name" />
        <AccountField {...form.field('email')} label="E-mail" kind="email" help="We e-mail it a link to choose your password" />
        <AccountField
          {...form.field('teamName')}
          label="Team name"
          kind="team"
          help="Your lab or group, as teammates will see it"
          onSubmit={submit}
        />
      </View>
      <SubmitButton label="E-mail me the link" busyLabel="Sending…" busy={request.isPending} onPress={submit} testID="submit-sign-up" />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
  row: { flexDirection: 'row' },
});
