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

export const signUpRequestSchema = z.strictObject({
  email,
  password,
  displayName,
  teamName: z.string({ error: 'teamName is required' }).trim().min(2, { error: 'teamName needs at least 2 characters' }).max(120),
});
export const signInRequestSchema = z.strictObject({ email, password: z.string({ error: 'password is required' }).min(1, { error: 'password is required' }).max(200) });
export const resetRequestSchema = z.strictObject({ email });
export const resetConfirmSchema = z.strictObject({ token: z.string().min(20, { error: 'token is missing or malformed' }).max(200), password });
export const acceptInvitationSchema = z.strictObject({ token: z.string().min(20, { error: 'token is missing or malformed' }).max(200), password, displayName });
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
export type SignInRequest = z.input<typeof signInRequestSchema>;
export type MeResponse = z.infer<typeof meResponseSchema>;
export type Member = z.infer<typeof memberSchema>;
export type Invitation = z.infer<typeof invitationSchema>;
export type TeamResponse = z.infer<typeof teamResponseSchema>;
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/**
 * Between processes (PostgreSQL NOTIFY → socket server), never sent to a
 * browser: this member's sockets must close, because they were removed or
 * their role changed (a reconnect then carries the new role).
 */
export const accountEndedSchema = z.object({ userId: z.string(), reason: z.enum(['removed', 'role']) });
export type AccountEnded = z.infer<typeof accountEndedSchema>;
