import { z } from 'zod';
import { idSchema } from './common';

/**
 * A job on the account-mail queue (API → worker). Anonymous requests only
 * enqueue one of these and answer at once, the same for every address; the
 * worker decides what the address gets (a link, or a note to the owner of an
 * existing account) and makes the link's token, so the request's time and
 * success never depend on the mail server and no raw token is stored.
 */
export const accountMailJobSchema = z.discriminatedUnion('kind', [
  /** Sign-up, step one: a link to choose the password, or "someone tried to sign up with your address". */
  z.object({ kind: z.literal('sign-up'), email: z.string().email(), displayName: z.string().min(1).max(80), teamName: z.string().min(2).max(120) }),
  /** A reset link for the active account of this address; nothing for an address without one. */
  z.object({ kind: z.literal('reset'), email: z.string().email() }),
  /** An invitation's link, or "you cannot join a second team with this account" to an address that has one. */
  z.object({ kind: z.literal('invitation'), invitationId: idSchema }),
  /** Tells the owner their password was changed (signed in) or reset (by link). */
  z.object({ kind: z.literal('password-changed'), userId: z.string().min(1), how: z.enum(['changed', 'reset']) }),
]);

export type AccountMailJob = z.infer<typeof accountMailJobSchema>;
