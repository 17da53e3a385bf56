import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import {
  invitationPreviewSchema,
  mailQueuedSchema,
  meResponseSchema,
  signUpPreviewSchema,
  type ChangePasswordRequest,
  type MeResponse,
  type SignInRequest,
  type SignUpConfirm,
  type SignUpRequest,
} from '@/shared/api/auth';
import { ApiError, apiCommand, apiGet, apiSend } from './client';

/** Everything about the session lives under `auth`; it survives a cache reset. */
export const meQueryKey = ['auth', 'me'] as const;

/** `GET /api/auth/me`: the signed-in member and team, or null when signed out (401). */
export function useMe() {
  return useQuery({
    queryKey: meQueryKey,
    queryFn: async ({ signal }): Promise<MeResponse | null> => {
      try {
        return await apiGet('/api/auth/me', meResponseSchema, { signal });
      } catch (error) {
        if (error instanceof ApiError && error.status === 401) return null;
        throw error;
      }
    },
    staleTime: 60_000,
  });
}

/**
 * A new session replaces whatever the last one cached: another member (or
 * nobody) must never see the previous member's data. The session query
 * itself is set, not removed, so the gate keeps its observer.
 */
export async function switchSession(queryClient: QueryClient, me: MeResponse | null): Promise<void> {
  const notAuth = { predicate: (query: { queryKey: readonly unknown[] }) => query.queryKey[0] !== 'auth' };
  await queryClient.cancelQueries(notAuth);
  queryClient.setQueryData(meQueryKey, me);
  queryClient.removeQueries(notAuth);
}

function useSessionMutation<V>(send: (variables: V) => Promise<MeResponse>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (me) => switchSession(queryClient, me),
  });
}

/** `POST /api/auth/sign-in`. */
export function useSignIn() {
  return useSessionMutation((body: SignInRequest) =>
    apiSend('POST', '/api/auth/sign-in', { json: body }, meResponseSchema),
  );
}

/**
 * `POST /api/auth/sign-up`, step one: always 202 "check your inbox", whether
 * or not the address has an account; no session yet.
 */
export function useRequestSignUp() {
  return useMutation({
    mutationFn: (body: SignUpRequest) => apiSend('POST', '/api/auth/sign-up', { json: body }, mailQueuedSchema),
  });
}

/** `GET /api/sign-up/:token`: the team, name and address a sign-up link will create (400 when unusable). */
export function useSignUpPreview(token: string) {
  return useQuery({
    queryKey: ['auth', 'sign-up', token],
    queryFn: ({ signal }) => apiGet(`/api/sign-up/${encodeURIComponent(token)}`, signUpPreviewSchema, { signal }),
    enabled: token.length > 0,
    staleTime: Infinity,
  });
}

/** `POST /api/auth/sign-up/confirm`, step two: the password makes the team and the account, and signs in. */
export function useConfirmSignUp() {
  return useSessionMutation((body: SignUpConfirm) =>
    apiSend('POST', '/api/auth/sign-up/confirm', { json: body }, meResponseSchema),
  );
}

export type AcceptInvitationVariables = { token: string; password: string; displayName: string };

/** `POST /api/invitations/accept`: makes the account and signs it in. */
export function useAcceptInvitation() {
  return useSessionMutation((body: AcceptInvitationVariables) =>
    apiSend('POST', '/api/invitations/accept', { json: body }, meResponseSchema),
  );
}

/** `POST /api/auth/sign-out`; the caches go whatever the server answered. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiCommand('POST', '/api/auth/sign-out', { none: true }),
    onSettled: () => switchSession(queryClient, null),
  });
}

/** `POST /api/auth/sign-out-everywhere`: every session of the account ends, this one too. */
export function useSignOutEverywhere() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiCommand('POST', '/api/auth/sign-out-everywhere', { none: true }),
    onSuccess: () => switchSession(queryClient, null),
  });
}

/** `POST /api/auth/password`: the current password proves it is you; every other session ends. */
export function useChangePassword() {
  return useMutation({
    mutationFn: (body: ChangePasswordRequest) => apiCommand('POST', '/api/auth/password', { json: body }),
  });
}

/** `POST /api/auth/reset-request`: always 202, whether or not the address has an account. */
export function useRequestReset() {
  return useMutation({
    mutationFn: (email: string) =>
      apiSend('POST', '/api/auth/reset-request', { json: { email } }, mailQueuedSchema),
  });
}

export type ResetPasswordVariables = { token: string; password: string };

/** `POST /api/auth/reset`: the link works once and ends every session of the account. */
export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ResetPasswordVariables) => apiCommand('POST', '/api/auth/reset', { json: body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: meQueryKey }),
  });
}

/** `GET /api/invitations/:token`: team, role and address of an invitation (400 when unusable). */
export function useInvitationPreview(token: string) {
  return useQuery({
    queryKey: ['auth', 'invitation', token],
    queryFn: ({ signal }) =>
      apiGet(`/api/invitations/${encodeURIComponent(token)}`, invitationPreviewSchema, { signal }),
    enabled: token.length > 0,
    staleTime: Infinity,
  });
}
