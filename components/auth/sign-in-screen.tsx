import { StyleSheet, View } from 'react-native';
import { signInRequestSchema } from '@/shared/api/auth';
import { useSignIn } from '@/components/api/auth';
import { spacing } from '@/components/theme';
import { AuthFrame } from './auth-frame';
import { AuthLink } from './auth-link';
import { AccountField } from './form/account-field';
import { FormProblem } from './form/form-alert';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';

const fields = ['email', 'password'] as const;

/** `/sign-in`: e-mail and password; the auth layout moves on once the session exists. */
export function SignInScreen() {
  const form = useAccountForm(fields, { email: '', password: '' });
  const signIn = useSignIn();
  const submit = () => {
    if (signIn.isPending || !form.check(signInRequestSchema)) return;
    signIn.mutate(form.values, { onError: form.fail });
  };
  return (
    <AuthFrame
      title="Sign in"
      subtitle="to your team's Frostgrade workspace"
      footer={<AuthLink lead="New to Frostgrade?" label="Start a team" href="/sign-up" testID="link-sign-up" />}
    >
      <FormProblem title="Not signed in" problem={form.errors.banner} testID="sign-in-problem" />
      <View style={styles.fields}>
        <AccountField {...form.field('email')} label="E-mail" kind="email" onSubmit={submit} />
        <AccountField {...form.field('password')} label="Password" kind="current-password" onSubmit={submit} />
        <AuthLink label="Forgot your password?" href="/forgot-password" testID="link-forgot" />
      </View>
      <SubmitButton label="Sign in" busyLabel="Signing in…" busy={signIn.isPending} onPress={submit} testID="submit-sign-in" />
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
});
