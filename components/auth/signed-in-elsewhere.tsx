import { useSignOut } from '@/components/api/auth';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import { FormAlert } from './form/form-alert';
import type { Session } from './session';

/** An invitation opened while someone is signed in: it makes a new account, so sign out first. */
export function SignedInElsewhere({ session }: { session: NonNullable<Session> }) {
  const signOut = useSignOut();
  return (
    <FormAlert tone="info" title={`You are signed in as ${session.user.displayName}`} testID="join-signed-in">
      <AppText>
        This invitation makes a new account. Sign out of {session.user.email} ({session.team.name}) first, then accept it
        here.
      </AppText>
      <Button label={signOut.isPending ? 'Signing out…' : 'Sign out'} onPress={() => signOut.mutate()} disabled={signOut.isPending} />
    </FormAlert>
  );
}
