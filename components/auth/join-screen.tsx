import { StyleSheet, View } from 'react-native';
import { router } from 'expo-router';
import { acceptInvitationSchema } from '@/shared/api/auth';
import { useAcceptInvitation, useInvitationPreview } from '@/components/api/auth';
import { spacing } from '@/components/theme';
import { AuthLink } from './auth-link';
import { AccountField, newPasswordHelp } from './form/account-field';
import { FormProblem } from './form/form-alert';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';
import { InvitationSummary } from './invitation-summary';
import { LinkPage } from './link-page';

const fields = ['displayName', 'password'] as const;

function AcceptForm({ token }: { token: string }) {
  const form = useAccountForm(fields, { displayName: '', password: '' });
  const accept = useAcceptInvitation();
  const submit = () => {
    if (accept.isPending || !form.check(acceptInvitationSchema, { token })) return;
    accept.mutate({ token, ...form.values }, { onError: form.fail, onSuccess: () => router.replace('/') });
  };
  return (
    <>
      <FormProblem title="Not joined" problem={form.errors.banner} testID="join-problem" />
      <View style={styles.fields}>
        <AccountField {...form.field('displayName')} label="Your name" kind="name" help="As your teammates will see it" />
        <AccountField
          {...form.field('password')}
          label="Choose a password"
          kind="new-password"
          help={newPasswordHelp}
          onSubmit={submit}
        />
      </View>
      <SubmitButton label="Accept and join" busyLabel="Joining…" busy={accept.isPending} onPress={submit} testID="submit-join" />
    </>
  );
}

/** `/join?token=…`: the link from an invitation e-mail. */
export function JoinScreen() {
  return (
    <LinkPage
      usePreview={useInvitationPreview}
      unusable={{
        page: 'Invitation not usable',
        alert: 'This link does not open an invitation',
        hint: 'Open the link from your invitation e-mail as it is, or ask an admin of the team to invite you again.',
        testID: 'join-unusable',
      }}
      loading={{ page: 'Join a team', label: 'Opening the invitation…' }}
      ready={(invitation) => ({
        title: 'You are invited',
        subtitle: `to ${invitation.teamName}. Choose your name and a password; you are signed in straight away.`,
        summary: <InvitationSummary preview={invitation} />,
      })}
      form={(token) => <AcceptForm token={token} />}
      signedIn={{ what: 'This invitation', testID: 'join-signed-in' }}
      footer={<AuthLink lead="Already a member?" label="Sign in" href="/sign-in" />}
    />
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
});
