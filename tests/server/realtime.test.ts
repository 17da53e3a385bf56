import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { io as connect, type Socket } from 'socket.io-client';
import { attachRealtime } from '../../server/realtime/socket-server';
import { watchRules } from '../../server/realtime/watch-rules';
import { demo, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
let http: Server;
let url: string;
let close: () => Promise<void>;
const sockets: Socket[] = [];

beforeAll(async () => {
  ctx = await openContext();
  http = createServer(ctx.app);
  const rt = await attachRealtime(http, { auth: ctx.auth, databaseUrl: ctx.env.databaseUrl, appOrigin: ctx.env.appOrigin, allowLoopback: false }, watchRules(ctx.ds));
  close = rt.close;
  await new Promise<void>((r) => http.listen(0, '127.0.0.1', r));
  url = `http://127.0.0.1:${(http.address() as AddressInfo).port}`;
});
afterAll(async () => {
  for (const s of sockets) s.disconnect();
  await close();
  await ctx.close();
});

async function cookieFor(email: string): Promise<string> {
  const [row] = await ctx.ds.query('SELECT id FROM app_user WHERE email = $1', [email]);
  return ctx.auth.createSessionCookie((await ctx.auth.createSession(row.id, {})).id).serialize();
}

/** Connects like a browser of the app would; resolves with the socket or the refusal message. */
function open(headers: Record<string, string>): Promise<{ socket?: Socket; refused?: string }> {
  const socket = connect(url, { transports: ['websocket'], extraHeaders: headers, reconnection: false, forceNew: true });
  sockets.push(socket);
  return new Promise((resolve) => {
    socket.once('connect', () => resolve({ socket }));
    socket.once('connect_error', (err) => resolve({ refused: err.message }));
  });
}

const origin = (): Record<string, string> => ({ Origin: ctx.env.appOrigin });

it('refuses a socket without a session, with a forged session, or from another origin', async () => {
  expect((await open(origin())).refused).toMatch(/sign in/);
  expect((await open({ ...origin(), Cookie: 'frostgrade_session=forged' })).refused).toMatch(/sign in/);
  expect((await open({ Origin: 'https://evil.example', Cookie: await cookieFor(demo.viewer) })).refused).toMatch(/origin/);
});

it('delivers a team\'s events to its members only', async () => {
  const mine = (await open({ ...origin(), Cookie: await cookieFor(demo.viewer) })).socket!;
  const theirs = (await open({ ...origin(), Cookie: await cookieFor(demo.otherTeamAdmin) })).socket!;
  const seenByOther: unknown[] = [];
  theirs.on('family:changed', (p) => seenByOther.push(p));
  const seenByMine: Array<{ familyId: string }> = [];
  mine.on('family:changed', (p: { familyId: string }) => seenByMine.push(p));
  const api = await signedIn(ctx, demo.physicist);
  const res = await api.post('/api/families').send({ name: `Live ${Date.now()}`, source: 'test', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } });
  expect(res.status).toBe(201);
  // Other test files change this team's families at the same time: look for ours.
  const deadline = Date.now() + 5000;
  while (!seenByMine.some((p) => p.familyId === res.body.family.id) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
  expect(seenByMine.map((p) => p.familyId)).toContain(res.body.family.id);
  await new Promise((r) => setTimeout(r, 300));
  expect(seenByOther).toEqual([]);
});

it('lets a member watch their own team\'s object but not another team\'s', async () => {
  const lab = await signedIn(ctx, demo.admin);
  const familyId = (await lab.get('/api/families')).body.families[0].id as string;
  const outsider = (await open({ ...origin(), Cookie: await cookieFor(demo.otherTeamAdmin) })).socket!;
  const insider = (await open({ ...origin(), Cookie: await cookieFor(demo.grower) })).socket!;
  const watch = (s: Socket, room: string) => new Promise<{ ok: boolean }>((r) => s.emit('watch', room, r));
  expect(await watch(outsider, `family:${familyId}`)).toEqual({ ok: false, error: 'no such object' });
  expect(await watch(insider, `family:${familyId}`)).toEqual({ ok: true });
  expect((await watch(insider, 'family:not-a-uuid')).ok).toBe(false);
  expect((await watch(insider, 'run:anything')).ok).toBe(false);
});
