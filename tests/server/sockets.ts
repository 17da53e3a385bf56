import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { io as connect, type Socket } from 'socket.io-client';
import { attachRealtime } from '../../server/realtime/socket-server';
import { watchRules } from '../../server/realtime/watch-rules';
import type { TestContext } from './context';

export type SocketServer = {
  /** A socket as a member's browser opens it (the app's Origin, the session cookie); reconnecting is left to the test. */
  open: (cookie: string) => Promise<Socket>;
  /** Disconnects every socket opened here, then stops the server's relay and socket.io. */
  close: () => Promise<void>;
};

/** socket.io on an HTTP server of the test's own around the test app, relaying NOTIFY like the API does. */
export async function socketServer(ctx: TestContext): Promise<SocketServer> {
  const http = createServer(ctx.app);
  const realtime = await attachRealtime(http, { auth: ctx.auth, databaseUrl: ctx.env.databaseUrl, appOrigin: ctx.env.appOrigin, allowLoopback: false }, watchRules(ctx.ds));
  await new Promise<void>((r) => http.listen(0, '127.0.0.1', r));
  const url = `http://127.0.0.1:${(http.address() as AddressInfo).port}`;
  const sockets: Socket[] = [];
  return {
    open: async (cookie) => {
      const s = connect(url, { transports: ['websocket'], extraHeaders: { Origin: ctx.env.appOrigin, Cookie: cookie }, reconnection: false, forceNew: true });
      sockets.push(s);
      await new Promise<void>((resolve, reject) => { s.once('connect', () => resolve()); s.once('connect_error', reject); });
      return s;
    },
    close: async () => {
      for (const s of sockets) s.disconnect();
      await realtime.close();
    },
  };
}

/** A new session of the account with this address, as its cookie. */
export async function cookieFor(ctx: TestContext, email: string): Promise<string> {
  const [row] = await ctx.ds.query('SELECT id FROM app_user WHERE email = $1 AND removed_at IS NULL', [email]);
  return ctx.auth.createSessionCookie((await ctx.auth.createSession((row as { id: string }).id, {})).id).serialize();
}
