import type { Server as HttpServer } from 'node:http';
import { Server, type Socket } from 'socket.io';
import type { User } from 'lucia';
import type { Auth } from '../auth/lucia';
import type { TeamEvent } from '../db/events';
import { startEventRelay, type RelayStatus } from './event-relay';
import { endMemberSockets } from './session-end';

export type RealtimeOptions = { auth: Auth; databaseUrl: string; appOrigin: string; allowLoopback: boolean };

/** Room names: every room name starts with the team's id, so no join can cross teams. */
export const teamRoom = (teamId: string): string => `team:${teamId}`;
export const objectRoom = (teamId: string, room: string): string => `team:${teamId}:${room}`;

type Watchable = (user: User, room: string) => Promise<boolean>;

function originAllowed(origin: string | undefined, o: RealtimeOptions): boolean {
  if (!origin) return false;
  return origin === new URL(o.appOrigin).origin || (o.allowLoopback && /^http:\/\/(127\.0\.0\.1|localhost):\d+$/.test(origin));
}

/**
 * socket.io on the API's HTTP server. A socket authenticates with the same
 * session cookie as HTTP, joins its team's room, and may `watch` an object
 * room only after `canWatch` confirms the object is its team's. Events come
 * from any process through PostgreSQL NOTIFY and are relayed here.
 */
export async function attachRealtime(http: HttpServer, o: RealtimeOptions, canWatch: Watchable): Promise<{ io: Server; relay: () => RelayStatus; close: () => Promise<void> }> {
  const io = new Server(http, { serveClient: false, cors: o.allowLoopback ? { origin: /^http:\/\/(127\.0\.0\.1|localhost):\d+$/, credentials: true } : undefined });
  io.use((socket, next) => {
    if (!originAllowed(socket.handshake.headers.origin, o)) return next(new Error('origin not allowed'));
    const id = o.auth.readSessionCookie(socket.handshake.headers.cookie ?? '');
    if (!id) return next(new Error('sign in first'));
    o.auth.validateSession(id).then(({ user, session }) => {
      if (!user || !session) return next(new Error('sign in first'));
      socket.data.user = user;
      // A sign-out closes only the sockets of the session it ends.
      socket.data.sessionId = session.id;
      next();
    }, (err: Error) => next(err));
  });
  io.on('connection', (socket: Socket) => {
    const user = socket.data.user as User;
    void socket.join(teamRoom(user.teamId));
    socket.on('watch', (room: unknown, ack?: (r: { ok: boolean; error?: string }) => void) => {
      const reply = typeof ack === 'function' ? ack : () => undefined;
      if (typeof room !== 'string' || room.length > 100) return reply({ ok: false, error: 'room must be a short string' });
      canWatch(user, room).then((ok) => {
        if (ok) void socket.join(objectRoom(user.teamId, room));
        reply(ok ? { ok } : { ok, error: 'no such object' });
      }, () => reply({ ok: false, error: 'no such object' }));
    });
    socket.on('unwatch', (room: unknown) => {
      if (typeof room === 'string') void socket.leave(objectRoom(user.teamId, room));
    });
  });
  const relay = await startEventRelay(o.databaseUrl, (e: TeamEvent) => {
    if (endMemberSockets(io, e)) return;
    io.to(e.room ? objectRoom(e.teamId, e.room) : teamRoom(e.teamId)).emit(e.event, e.payload);
  });
  return {
    io,
    relay: relay.status,
    close: async () => {
      await relay.close();
      await new Promise<void>((resolve) => { void io.close(() => resolve()); });
    },
  };
}
