import { z } from 'zod';
import { idSchema, isoDateTimeSchema } from './common';

/** Roles of a team member (DESIGN.md): what each may do is enforced by the API's route table. */
export const roleSchema = z.enum(['admin', 'physicist', 'grower', 'viewer']);
export type Role = z.infer<typeof roleSchema>;
export const roles: readonly Role[] = roleSchema.options;

const email = z.string({ error: 'email is required' }).trim().toLowerCase().max(254, { error: 'email is too long' }).email({ error: 'email is not a valid address' });
/** Long passphrases welcome; a short one is refused (length matters more than symbols). */
const password = z.string({ error: 'password is required' }).min(10, { error: 'password must be at least 10 characters' }).max(200, { error: 'password must be at most 200 characters' });
const displayName = z.string({ error: 'displayName is required' }).trim().min(1, { error: 'displayName is required' }).max(80, { error: 'displayName is at most 80 characters' });

const teamName = z.string({ error: 'teamName is required' }).trim().min(2, { error: 'teamName needs at least 2 characters' }).max(120, { error: 'teamName is at most 120 characters' });
const token = z.string({ error: 'token is missing or malformed' }).min(20, { error: 'token is missing or malformed' }).max(200, { error: 'token is missing or malformed' });

/**
 * Sign-up, step one: answered 202 "check your inbox" whatever the address;
 * the link mailed to it (or, for an address with an account, a note to its
 * owner) leads to step two, where the password is chosen.
 */
export const signUpRequestSchema = z.strictObject({ email, displayName, teamName });
/** Sign-up, step two: the mailed single-use link and the password; makes the team and the account and signs in. */
export const signUpConfirmSchema = z.strictObject({ token, password });
/** `GET /api/sign-up/:token` — what the confirm page shows before the account is made. */
export const signUpPreviewSchema = z.object({ email: z.string(), displayName: z.string(), teamName: z.string(), expiresAt: isoDateTimeSchema });
/** The one answer of every anonymous request that mails something: it never says whether the address has an account. */
export const mailQueuedSchema = z.object({ message: z.string() });
/** Signed in: a new password, proven by the current one; every other session ends. */
export const changePasswordSchema = z.strictObject({
  currentPassword: z.string({ error: 'currentPassword is required' }).min(1, { error: 'currentPassword is required' }).max(200, { error: 'currentPassword is at most 200 characters' }),
  newPassword: password,
});
export const signInRequestSchema = z.strictObject({ email, password: z.string({ error: 'password is required' }).min(1, { error: 'password is required' }).max(200) });
export const resetRequestSchema = z.strictObject({ email });
export const resetConfirmSchema = z.strictObject({ token, password });
export const acceptInvitationSchema = z.strictObject({ token, password, displayName });
export const inviteRequestSchema = z.strictObject({ email, role: roleSchema });
export const changeRoleRequestSchema = z.strictObject({ role: roleSchema });

export const meResponseSchema = z.object({
  user: z.object({ id: z.string(), email: z.string(), displayName: z.string(), role: roleSchema }),
  team: z.object({ id: idSchema, name: z.string() }),
});

export const memberSchema = z.object({ id: z.string(), email: z.string(), displayName: z.string(), role: roleSchema, joinedAt: isoDateTimeSchema });
export const invitationSchema = z.object({
  id: idSchema,
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  createdAt: isoDateTimeSchema,
  expiresAt: isoDateTimeSchema,
  state: z.enum(['pending', 'accepted', 'revoked', 'expired']),
});
export const teamResponseSchema = z.object({ members: z.array(memberSchema), invitations: z.array(invitationSchema) });
/** `GET /api/invitations/:token` — what the join page shows before the account is made. */
export const invitationPreviewSchema = z.object({ email: z.string(), role: roleSchema, teamName: z.string(), expiresAt: isoDateTimeSchema });

export type SignUpRequest = z.input<typeof signUpRequestSchema>;
export type SignUpConfirm = z.input<typeof signUpConfirmSchema>;
export type SignUpPreview = z.infer<typeof signUpPreviewSchema>;
export type ChangePasswordRequest = z.input<typeof changePasswordSchema>;
export type SignInRequest = z.input<typeof signInRequestSchema>;
export type MeResponse = z.infer<typeof meResponseSchema>;
export type Member = z.infer<typeof memberSchema>;
export type Invitation = z.infer<typeof invitationSchema>;
export type TeamResponse = z.infer<typeof teamResponseSchema>;
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/**
 * Between processes (PostgreSQL NOTIFY → socket server), never sent to a
 * browser: this member's sockets must close, because they were removed,
 * their role changed (a reconnect then carries the new role), their password
 * changed or was reset, or they signed out everywhere. With `sessionId`
 * (a sign-out) only the sockets opened with that session close.
 */
export const accountEndedSchema = z.object({
  userId: z.string(),
  reason: z.enum(['removed', 'role', 'signed-out', 'password', 'sessions-ended']),
  sessionId: z.string().optional(),
});
export type AccountEnded = z.infer<typeof accountEndedSchema>;
