import { io, type Socket } from 'socket.io-client';
import { apiBaseUrl } from '@/components/api/client';

/**
 * A socket.io connection to the API. It authenticates with the session
 * cookie (same origin on the web; `EXPO_PUBLIC_API_URL` when the dev server
 * runs elsewhere) and lands in its team's room, where `run:state` events
 * arrive; `watch` adds the room of one object (e.g. `run:<id>`).
 */
export function openSocket(): Socket {
  const base = apiBaseUrl();
  const options = { withCredentials: true };
  return base ? io(base, options) : io(options);
}
