import { io, type Socket } from 'socket.io-client';
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
 */
export function openSocket(): Socket {
  const base = apiBaseUrl();
  const options = { withCredentials: true, transports: ['websocket'] };
  return base ? io(base, options) : io(options);
}
