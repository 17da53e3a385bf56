import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { teamResponseSchema, type Role, type TeamResponse } from '@/shared/api/auth';
import { meQueryKey } from './auth';
import { apiCommand, apiGet, apiSend } from './client';

export const teamQueryKey = ['team'] as const;

/** `GET /api/team`: members (oldest first) and invitations (newest first) of your team. */
export function useTeam() {
  return useQuery({
    queryKey: teamQueryKey,
    queryFn: ({ signal }) => apiGet('/api/team', teamResponseSchema, { signal }),
  });
}

/** Answers that carry the whole team replace it; 204s make it refetch. */
function useTeamUpdate() {
  const queryClient = useQueryClient();
  return {
    replace: (team: TeamResponse) => queryClient.setQueryData(teamQueryKey, team),
    refetch: () => queryClient.invalidateQueries({ queryKey: teamQueryKey }),
    /** An admin may have changed their own role. */
    refreshMe: () => queryClient.invalidateQueries({ queryKey: meQueryKey }),
  };
}

export type InviteVariables = { email: string; role: Role };

/** `POST /api/team/invitations` (admin): e-mails a single-use link valid for 7 days. */
export function useInvite() {
  const { replace } = useTeamUpdate();
  return useMutation({
    mutationFn: (body: InviteVariables) =>
      apiSend('POST', '/api/team/invitations', { json: body }, teamResponseSchema),
    onSuccess: replace,
  });
}

/** `DELETE /api/team/invitations/:id` (admin): the link stops working. */
export function useRevokeInvitation() {
  const { refetch } = useTeamUpdate();
  return useMutation({
    mutationFn: (id: string) =>
      apiCommand('DELETE', `/api/team/invitations/${encodeURIComponent(id)}`, { none: true }),
    onSettled: refetch,
  });
}

export type ChangeRoleVariables = { memberId: string; role: Role };

/** `PUT /api/team/members/:id/role` (admin); 409 when it would leave the team without an admin. */
export function useChangeRole() {
  const { replace, refreshMe } = useTeamUpdate();
  return useMutation({
    mutationFn: ({ memberId, role }: ChangeRoleVariables) =>
      apiSend('PUT', `/api/team/members/${encodeURIComponent(memberId)}/role`, { json: { role } }, teamResponseSchema),
    onSuccess: async (team) => {
      replace(team);
      await refreshMe();
    },
  });
}

/** `DELETE /api/team/members/:id` (admin): the account and its sessions go; 409 for the last admin. */
export function useRemoveMember() {
  const { refetch } = useTeamUpdate();
  return useMutation({
    mutationFn: (memberId: string) =>
      apiCommand('DELETE', `/api/team/members/${encodeURIComponent(memberId)}`, { none: true }),
    onSettled: refetch,
  });
}
