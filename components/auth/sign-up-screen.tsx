import { StyleSheet, View } from 'react-native';
import { signUpRequestSchema } from '@/shared/api/auth';
import { useSignUp } from '@/components/api/auth';
import { spacing } from '@/components/theme';
import { AuthFrame } from './auth-frame';
import { AuthLink } from './auth-link';
import { AccountField } from './form/account-field';
import { FormAlert } from './form/form-alert';
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
  const { values, errors, set } = form;
  return (
    <AuthFrame
      title="Start a team"
      subtitle="You become its admin and invite physicists, growers and viewers. Joining an existing team? Use the link in your invitation e-mail instead."
      footer={<AuthLink lead="Have an account?" label="Sign in" href="/sign-in" testID="link-sign-in" />}
    >
      {errors.banner ? (
        <FormAlert tone="danger" title="Team not created">
          {errors.banner}
        </FormAlert>
      ) : null}
      <View style={styles.fields}>
        <AccountField id="displayName" label="Your name" kind="name" value={values.displayName} onChangeText={set('displayName')} error={errors.fields.displayName} />
        <AccountField id="email" label="E-mail" kind="email" value={values.email} onChangeText={set('email')} error={errors.fields.email} />
        <AccountField
          id="teamName"
          label="Team name"
          kind="team"
          value={values.teamName}
          onChangeText={set('teamName')}
          error={errors.fields.teamName}
          help="Your lab or group, as teammates will see it"
        />
        <AccountField
          id="password"
          label="Password"
          kind="new-password"
          value={values.password}
          onChangeText={set('password')}
          error={errors.fields.password}
          help="At least 10 characters; a few unrelated words work well"
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
