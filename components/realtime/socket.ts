import type { QueryClient } from '@tanstack/react-query';
import { io, type Socket } from 'socket.io-client';
import { meQueryKey } from '@/components/api/auth';
import { apiBaseUrl } from '@/components/api/client';

/**
 * A socket.io connection to the API. It authenticates with the session
 * cookie (same origin on the web; `EXPO_PUBLIC_API_URL` when the dev server
 * runs elsewhere) and lands in its team's room, where `run:state` events
 * arrive; `watch` adds the room of one object (e.g. `run:<id>`).
 *
 * WebSocket only: the server checks the handshake's Origin, which browsers
 * always send on a WebSocket upgrade but leave out of same-origin polling
 * GETs (so a polling handshake is refused as "origin not allowed").
 *
 * The server closes a member's sockets when their role changes or they are
 * removed, and socket.io never reconnects after that on its own: the session
 * is asked for again (a removed member's 401 takes the page to sign-in) and
 * the socket reconnects once. That handshake carries the new role, or is
 * refused — and a refused handshake is not retried, so nothing loops.
 * Lost connections (server restart, network) reconnect by themselves.
 */
export function openSocket(queryClient: QueryClient): Socket {
  const base = apiBaseUrl();
  const options = { withCredentials: true, transports: ['websocket'] };
  const socket = base ? io(base, options) : io(options);
  socket.on('disconnect', (reason: string) => {
    if (reason !== 'io server disconnect') return;
    void queryClient.invalidateQueries({ queryKey: meQueryKey });
    socket.connect();
  });
  return socket;
}
