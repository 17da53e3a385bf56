import type { Server } from 'socket.io';
import type { EntityManager } from 'typeorm';
import { accountEndedSchema, type AccountEnded } from '../../shared/api/auth';
import { eventChannel, type TeamEvent } from '../db/events';

/** Event name of a member's sockets ending; handled by the socket server, never relayed. */
export const accountEnded = 'account:ended';

/**
 * Tells every API process (through NOTIFY) to close this member's sockets
 * (with `sessionId`, only those opened with that session). Sent inside the
 * caller's transaction: PostgreSQL delivers it only if the removal, role
 * change, sign-out or password change commits, and then surely.
 */
export async function announceAccountEnded(m: EntityManager, teamId: string, e: AccountEnded): Promise<void> {
  const event: TeamEvent = { teamId, event: accountEnded, payload: e };
  await m.query('SELECT pg_notify($1, $2)', [eventChannel, JSON.stringify(event)]);
}

/**
 * Closes the sockets this process holds for the member named by an
 * `account:ended` event (socket.data.user, and socket.data.sessionId when
 * the event names a session), and says whether the event was one (so it is
 * not relayed to browsers). The server-side disconnect does not
 * auto-reconnect on the client; the client decides (components/realtime/socket.ts).
 */
export function endMemberSockets(io: Server, e: TeamEvent): boolean {
  if (e.event !== accountEnded) return false;
  const parsed = accountEndedSchema.safeParse(e.payload);
  if (!parsed.success) {
    console.error(`[realtime] ${accountEnded} event without a member id: ignored`);
    return true;
  }
  const { userId, sessionId } = parsed.data;
  for (const socket of io.of('/').sockets.values()) {
    const user = socket.data.user as { id?: unknown; teamId?: unknown } | undefined;
    if (user?.id !== userId || user.teamId !== e.teamId) continue;
    if (sessionId === undefined || socket.data.sessionId === sessionId) socket.disconnect(true);
  }
  return true;
}
