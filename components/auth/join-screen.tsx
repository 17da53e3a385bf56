import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { router, useLocalSearchParams } from 'expo-router';
import { acceptInvitationSchema } from '@/shared/api/auth';
import { useAcceptInvitation, useInvitationPreview } from '@/components/api/auth';
import { spacing } from '@/components/theme';
import { LoadingState } from '@/components/ui/state-views';
import { AuthFrame } from './auth-frame';
import { AuthLink } from './auth-link';
import { AccountField, newPasswordHelp } from './form/account-field';
import { FormAlert, FormProblem } from './form/form-alert';
import { errorsFrom } from './form/form-errors';
import { SubmitButton } from './form/submit-button';
import { useAccountForm } from './form/use-account-form';
import { InvitationSummary } from './invitation-summary';
import { useSession } from './session';
import { SignedInElsewhere } from './signed-in-elsewhere';

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
  const { token = '' } = useLocalSearchParams<{ token?: string }>();
  const session = useSession();
  // Once this page has made the account, the session belongs to it: no "signed in elsewhere".
  const [startedSignedIn] = useState(session !== null);
  const preview = useInvitationPreview(token);
  const footer = <AuthLink lead="Already a member?" label="Sign in" href="/sign-in" />;
  if (!token || preview.isError) {
    return (
      <AuthFrame title="Invitation not usable" footer={footer}>
        <FormAlert tone="danger" title="This link does not open an invitation" testID="join-unusable">
          {preview.error
            ? errorsFrom(preview.error, []).banner
            : 'Open the link from your invitation e-mail as it is, or ask an admin of the team to invite you again.'}
        </FormAlert>
      </AuthFrame>
    );
  }
  if (!preview.data) {
    return (
      <AuthFrame title="Join a team">
        <LoadingState label="Opening the invitation…" />
      </AuthFrame>
    );
  }
  return (
    <AuthFrame
      title="You are invited"
      subtitle={`to ${preview.data.teamName}. Choose your name and a password; you are signed in straight away.`}
      footer={footer}
    >
      <InvitationSummary preview={preview.data} />
      {startedSignedIn && session ? <SignedInElsewhere session={session} /> : <AcceptForm token={token} />}
    </AuthFrame>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
});
