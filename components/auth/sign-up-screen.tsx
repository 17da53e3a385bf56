import { StyleSheet, View } from 'react-native';
import { signUpRequestSchema } from '@/shared/api/auth';
import { useSignUp } from '@/components/api/auth';
import { spacing } from '@/components/theme';
import { AuthFrame } from './auth-frame';
import { AuthLink } from './auth-link';
import { AccountField, newPasswordHelp } from './form/account-field';
import { FormProblem } from './form/form-alert';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';

const fields = ['displayName', 'email', 'teamName', 'password'] as const;

/** `/sign-up`: a new account brings a new team, and its first member is the admin. */
export function SignUpScreen() {
  const form = useAccountForm(fields, { displayName: '', email: '', teamName: '', password: '' });
  const signUp = useSignUp();
  const submit = () => {
    if (signUp.isPending || !form.check(signUpRequestSchema)) return;
    signUp.mutate(form.values, { onError: form.fail });
  };
  return (
    <AuthFrame
      title="Start a team"
      subtitle="You become its admin and invite physicists, growers and viewers. Joining an existing team? Use the link in your invitation e-mail instead."
      footer={<AuthLink lead="Have an account?" label="Sign in" href="/sign-in" testID="link-sign-in" />}
    >
      <FormProblem title="Team not created" problem={form.errors.banner} />
      <View style={styles.fields}>
        <AccountField {...form.field('displayName')} label="Your name" kind="name" />
        <AccountField {...form.field('email')} label="E-mail" kind="email" />
        <AccountField {...form.field('teamName')} label="Team name" kind="team" help="Your lab or group, as teammates will see it" />
        <AccountField
          {...form.field('password')}
          label="Password"
          kind="new-password"
          help={newPasswordHelp}
          onSubmit={submit}
        />
      </View>
      <SubmitButton label="Create team and account" busyLabel="Creating…" busy={signUp.isPending} onPress={submit} testID="submit-sign-up" />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
});
