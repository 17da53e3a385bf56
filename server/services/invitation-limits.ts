import type { EntityManager } from 'typeorm';
import { retryWords } from '../auth/rate-limit';
import { RetryLaterError } from '../http/errors';

/**
 * What one team may send. Invitations mail strangers, so a team (which
 * anyone can create) may not mail without end: at most `perDay` in any 24
 * hours (revoked ones count: the mail went out) and `pending` waiting at once.
 */
export const invitationLimits = { perDay: 20, pending: 50 } as const;

type Counts = { today: number; today_frees: number | null; pending: number; pending_frees: number | null };

/** Refuses with 429 naming the limit, and Retry-After when a slot frees (the oldest invitation of the day ages out, or the soonest pending one expires). */
export async function checkInvitationLimits(m: EntityManager, teamId: string): Promise<void> {
  const [c]: Counts[] = await m.query(
    `SELECT count(*) FILTER (WHERE created_at > now() - interval '1 day')::int AS today,
       extract(epoch FROM min(created_at) FILTER (WHERE created_at > now() - interval '1 day') + interval '1 day' - now())::float8 AS today_frees,
       count(*) FILTER (WHERE accepted_at IS NULL AND revoked_at IS NULL AND expires_at > now())::int AS pending,
       extract(epoch FROM min(expires_at) FILTER (WHERE accepted_at IS NULL AND revoked_at IS NULL AND expires_at > now()) - now())::float8 AS pending_frees
     FROM invitation WHERE team_id = $1`, [teamId]);
  if (!c) return;
  if (c.today >= invitationLimits.perDay) {
    const retryAfter = Math.max(1, Math.ceil(c.today_frees ?? 86400));
    throw new RetryLaterError(429, `Your team has sent ${c.today} invitations in the last 24 hours, the most it may; ${retryWords(retryAfter)}.`,
      [{ field: 'email', message: `at most ${invitationLimits.perDay} invitations a day per team` }], retryAfter);
  }
  if (c.pending >= invitationLimits.pending) {
    const retryAfter = Math.max(1, Math.ceil(c.pending_frees ?? 86400));
    throw new RetryLaterError(429, `Your team has ${c.pending} pending invitations, the most it may hold: revoke some, or wait until they are accepted or expire (${retryWords(retryAfter)}).`,
      [{ field: 'email', message: `at most ${invitationLimits.pending} pending invitations per team` }], retryAfter);
  }
}
