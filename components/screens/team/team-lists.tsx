import { View } from 'react-native';
import type { TeamResponse } from '@/shared/api/auth';
import { AppText } from '@/components/ui/text';
import { InvitationRow } from './invitation-row';
import { MemberRow } from './member-row';
import { Section as TeamSection } from '@/components/ui/form-section';

type ListProps = { team: TeamResponse; manage: boolean };

export function MemberList({ team, manage, youId }: ListProps & { youId: string }) {
  const count = team.members.length;
  return (
    <TeamSection title="Members" hint={`${count} ${count === 1 ? 'member' : 'members'}, in the order they joined`} testID="members">
      <View role="list" aria-label="Members">
        {team.members.map((member) => (
          <MemberRow key={member.id} member={member} isYou={member.id === youId} manage={manage} />
        ))}
      </View>
    </TeamSection>
  );
}

export function InvitationList({ team, manage }: ListProps) {
  const pending = team.invitations.filter((invitation) => invitation.state === 'pending').length;
  return (
    <TeamSection title="Invitations" hint={`${pending} pending; newest first`} testID="invitations">
      {team.invitations.length === 0 ? (
        <AppText tone="muted">No invitations yet.</AppText>
      ) : (
        <View role="list" aria-label="Invitations">
          {team.invitations.map((invitation) => (
            <InvitationRow key={invitation.id} invitation={invitation} manage={manage} />
          ))}
        </View>
      )}
    </TeamSection>
  );
}
