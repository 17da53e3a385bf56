import { useSignOut } from '@/components/api/auth';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { FormAlert } from './form/form-alert';
import type { Session } from './session';

/** A link that makes an account (an invitation, a sign-up) opened while someone is signed in: sign out first. */
export function SignedInElsewhere({ session, what = 'This invitation', testID = 'join-signed-in' }: { session: NonNullable<Session>; what?: string; testID?: string }) {
  const signOut = useSignOut();
  return (
    <FormAlert tone="info" title={`You are signed in as ${session.user.displayName}`} testID={testID}>
      <AppText>
        {what} makes a new account. Sign out of {session.user.email} ({session.team.name}) first, then use it here.
      </AppText>
      <Button label={signOut.isPending ? 'Signing out…' : 'Sign out'} onPress={() => signOut.mutate()} disabled={signOut.isPending} />
    </FormAlert>
  );
}
