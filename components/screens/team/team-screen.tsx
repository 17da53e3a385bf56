import { useRole, useSession } from '@/components/auth/session';
import { FormAlert } from '@/components/auth/form/form-alert';
import { roleLabels, roleSummaries } from '@/components/auth/permissions';
import { useTeam } from '@/components/api/team';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { LinkButton } from '@/components/ui/link-button';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { InviteSection } from './invite-section';
import { InvitationList, MemberList } from './team-lists';

/** Members and invitations of your team; admins invite, change roles, remove and revoke, and read the audit trail. */
export function TeamScreen() {
  const session = useSession();
  const { role, can } = useRole();
  const query = useTeam();
  const manage = can('team.manage');
  const refresh = () => void query.refetch();
  return (
    <ScreenFrame
      title="Team"
      subtitle={session?.team.name}
      accessory={can('audit.read') ? <LinkButton label="Audit trail" href="/team/audit" variant="quiet" testID="open-audit" /> : undefined}
      refreshing={query.isRefetching}
      onRefresh={refresh}
    >
      {role && !manage ? (
        <FormAlert tone="info" title={`Your role: ${roleLabels[role]}`} testID="role-note">
          {`${roleSummaries[role]}. Admins invite members and change roles.`}
        </FormAlert>
      ) : null}
      {manage ? <InviteSection /> : null}
      {query.isPending ? <LoadingState label="Loading the team…" /> : null}
      {query.isError ? (
        <ErrorState title="Could not load the team" message={query.error.message} onRetry={refresh} retrying={query.isFetching} />
      ) : null}
      {query.data ? <MemberList team={query.data} manage={manage} youId={session?.user.id ?? ''} /> : null}
      {query.data ? <InvitationList team={query.data} manage={manage} /> : null}
    </ScreenFrame>
  );
}
