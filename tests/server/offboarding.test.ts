import { randomUUID } from 'node:crypto';
import type { Socket } from 'socket.io-client';
import { growthOrderDetailSchema, growthOrdersResponseSchema, meResponseSchema, runsResponseSchema, teamResponseSchema } from '../../shared/api';
import { accountMailDone, agent, agentAt, databaseNow, demo, eventually, mailTo, newTeam, openContext, signedIn, tokenIn as linkToken, type TestContext } from './context';
import { socketServer, type SocketServer } from './sockets';

/**
 * Offboarding against the real stack: the test stack's worker takes the
 * runs (queue leg-run), the mail catcher receives the mail, and a socket.io
 * server on the test's own HTTP server relays NOTIFY like the API does.
 */
let ctx: TestContext;
let realtime: SocketServer;
jest.setTimeout(240_000);

beforeAll(async () => {
  ctx = await openContext();
  realtime = await socketServer(ctx);
});
afterAll(async () => {
  await realtime.close();
  await ctx.close();
});

type Api = ReturnType<typeof agent>;
const password = 'a long enough passphrase';
const fresh = (stem: string): string => `${stem}.${Date.now()}.${Math.round(Math.random() * 1e9)}@example.test`;

/** Invites an address into the demo lab and accepts; answers the member's own client, cookie and id. */
async function join(admin: Api, email: string, role: string, displayName: string): Promise<{ api: Api; cookie: string; id: string }> {
  const before = await databaseNow(ctx);
  expect((await admin.post('/api/team/invitations').send({ email, role })).status).toBe(201);
  // The link goes out from a worker: wait for this invitation's mail, not an older one to the same address.
  const mail = await mailTo(ctx, email, /invited to join a team/, { after: before });
  const api = agent(ctx);
  const res = await api.post('/api/invitations/accept').send({ token: linkToken(mail.text, '/join'), password, displayName });
  expect(res.status).toBe(201);
  const cookie = String(res.headers['set-cookie']).split(';')[0]!;
  return { api, cookie, id: meResponseSchema.parse(res.body).user.id };
}

/** A socket as the member's browser opens it: same cookie, the app's Origin; reconnecting is left to the test. */
const socketWith = (cookie: string): Promise<Socket> => realtime.open(cookie);

/** The reason socket.io gives for the next disconnect (sanity bound only: the point is that it comes). */
const nextDisconnect = (s: Socket): Promise<string> => new Promise((resolve, reject) => {
  const timer = setTimeout(() => reject(new Error('the socket was not disconnected')), 10_000);
  s.once('disconnect', (reason) => { clearTimeout(timer); resolve(reason); });
});

/** Reconnects by hand, as the client does after a server disconnect; answers 'connected' or the refusal. */
const reconnect = (s: Socket): Promise<string> => new Promise((resolve) => {
  s.once('connect', () => resolve('connected'));
  s.once('connect_error', (err) => resolve(err.message));
  s.connect();
});

async function runState(api: Api, runId: string, states: string[]): Promise<string> {
  return eventually(async () => {
    const state = (await api.get(`/api/runs/${runId}`)).body.run?.state as string | undefined;
    return state && states.includes(state) ? state : undefined;
  }, 120);
}

it('removing a member who launched runs and released an order keeps the history, ends sessions, sockets and mail, and frees the address', async () => {
  const admin = await signedIn(ctx, demo.admin);
  const email = fresh('leaving.physicist');
  const name = `Leaving Physicist ${Date.now()}`;
  const leaver = await join(admin, email, 'physicist', name);

  // Their work: a converged run released as a growth order, and a long run still going.
  const families = (await leaver.api.get('/api/families')).body.families as Array<{ id: string; name: string }>;
  const family = families.find((f) => f.name.startsWith('NL-P7 (Bi,Sb)'))!;
  const input = { name: `Offboarding ${Date.now()}`, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 6, starts: 1 };
  const design = await leaver.api.post('/api/designs').send(input);
  expect(design.status).toBe(201);
  const designId = design.body.design.id as string;
  const converged = (await leaver.api.post(`/api/designs/${designId}/runs`)).body.run.id as string;
  expect(await runState(leaver.api, converged, ['succeeded', 'failed'])).toBe('succeeded');
  const released = await leaver.api.post(`/api/runs/${converged}/release`).send({ batch: `OFF-${Date.now()}` });
  expect(released.status).toBe(201);
  const orderId = released.body.order.id as string;
  expect((await leaver.api.put(`/api/designs/${designId}`).send({ ...input, starts: 3000 })).status).toBe(200);
  const long = (await leaver.api.post(`/api/designs/${designId}/runs`)).body.run.id as string;
  expect(await runState(leaver.api, long, ['running', 'succeeded', 'failed'])).toBe('running');
  // The admin follows the design too, so the long run's end is mailed to someone.
  expect((await admin.post(`/api/designs/${designId}/follow`)).status).toBeLessThan(300);

  const theirs = await socketWith(leaver.cookie);
  const disconnected = nextDisconnect(theirs);
  expect((await admin.delete(`/api/team/members/${leaver.id}`)).status).toBe(204);

  // Their socket is closed by the server (no automatic reconnect), and a new handshake is refused.
  expect(await disconnected).toBe('io server disconnect');
  expect(await reconnect(theirs)).toMatch(/sign in/);
  expect(theirs.active).toBe(false);
  // Their session is gone at once: the old cookie is "signed out".
  expect((await leaver.api.get('/api/auth/me')).status).toBe(401);
  expect((await leaver.api.get('/api/runs')).status).toBe(401);
  expect(await ctx.ds.query('SELECT 1 FROM user_session WHERE user_id = $1', [leaver.id])).toEqual([]);
  expect(await ctx.ds.query('SELECT 1 FROM design_follower WHERE user_id = $1', [leaver.id])).toEqual([]);
  // They cannot sign in again or get a reset link.
  expect((await agent(ctx).post('/api/auth/sign-in').send({ email, password })).status).toBe(400);
  expect((await agent(ctx).post('/api/auth/reset-request').send({ email })).status).toBe(202);

  // The long run they launched ends after their removal: the follower hears of it, they do not.
  expect((await admin.post(`/api/runs/${long}/cancel`)).status).toBe(200);
  // Cancelled even when stopped before its first start finished (then with no design kept); its worker mails.
  expect(await runState(admin, long, ['cancelled', 'succeeded', 'failed'])).toBe('cancelled');
  const endMail = await eventually(async () => (await ctx.ds.query('SELECT mail_to FROM captured_mail WHERE text LIKE $1', [`%/runs/${long}%`]))[0] as { mail_to: string[] } | undefined);
  expect(endMail.mail_to).toContain(demo.admin);
  expect(endMail.mail_to).not.toContain(email);

  // History keeps their name.
  const runs = runsResponseSchema.parse((await admin.get(`/api/runs?designId=${designId}`)).body).runs;
  expect(runs.map((r) => r.launchedBy)).toEqual([name, name]);
  const orders = growthOrdersResponseSchema.parse((await admin.get('/api/growth-orders')).body).orders;
  expect(orders.find((o) => o.id === orderId)?.releasedBy).toBe(name);
  const order = growthOrderDetailSchema.parse((await admin.get(`/api/growth-orders/${orderId}`)).body);
  expect(order.timeline[0]).toMatchObject({ kind: 'released', by: name });
  // …but they are no longer a member, and cannot be removed twice.
  const team = teamResponseSchema.parse((await admin.get('/api/team')).body);
  expect(team.members.map((m) => m.email)).not.toContain(email);
  expect((await admin.delete(`/api/team/members/${leaver.id}`)).status).toBe(404);
  expect((await admin.put(`/api/team/members/${leaver.id}/role`).send({ role: 'admin' })).status).toBe(404);
  // No reset mail went out to the removed account: the worker has done the job and sent nothing.
  expect(await accountMailDone(ctx, { kind: 'reset', email })).toMatch(/nothing sent/);
  expect(await ctx.ds.query(`SELECT 1 FROM captured_mail WHERE $1 = ANY(mail_to) AND subject LIKE '%Reset%'`, [email])).toEqual([]);

  // The address can be invited again; the new account is a new member, the old history keeps the old name.
  const back = await join(admin, email, 'viewer', 'Returning Viewer');
  expect(back.id).not.toBe(leaver.id);
  expect(meResponseSchema.parse((await back.api.get('/api/auth/me')).body).user).toMatchObject({ email, role: 'viewer', displayName: 'Returning Viewer' });
  expect(runsResponseSchema.parse((await back.api.get(`/api/runs?designId=${designId}`)).body).runs.map((r) => r.launchedBy)).toEqual([name, name]);
  expect(teamResponseSchema.parse((await admin.get('/api/team')).body).members.filter((m) => m.email === email).map((m) => m.id)).toEqual([back.id]);
});

it('a role change closes that member\'s sockets only; the reconnect carries the new role', async () => {
  const admin = await signedIn(ctx, demo.admin);
  const member = await join(admin, fresh('promoted'), 'viewer', 'Promoted Viewer');
  const other = await join(admin, fresh('unchanged'), 'viewer', 'Unchanged Viewer');
  const mine = await socketWith(member.cookie);
  const theirs = await socketWith(other.cookie);
  let otherDropped = false;
  theirs.on('disconnect', () => { otherDropped = true; });
  const disconnected = nextDisconnect(mine);
  expect((await admin.put(`/api/team/members/${member.id}/role`).send({ role: 'physicist' })).status).toBe(200);
  expect(await disconnected).toBe('io server disconnect');
  expect(await reconnect(mine)).toBe('connected');
  // The session survives a role change, and the next request already has the new role.
  expect(meResponseSchema.parse((await member.api.get('/api/auth/me')).body).user.role).toBe('physicist');
  expect((await member.api.post('/api/families').send({ name: `Promoted ${Date.now()}`, source: 'test', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } })).status).toBe(201);
  // The reconnected socket works (it may watch its team's objects) and the other member's never dropped.
  const familyId = (await admin.get('/api/families')).body.families[0].id as string;
  expect(await new Promise((r) => mine.emit('watch', `family:${familyId}`, r))).toEqual({ ok: true });
  expect(otherDropped).toBe(false);
  expect(theirs.connected).toBe(true);
});

describe('a member\'s own sign-out, password reset, password change and "sign out everywhere" close their sockets', () => {
  /** The same account signed in on a second device: its client and session cookie. */
  async function secondDevice(email: string, password: string): Promise<{ api: Api; cookie: string }> {
    const api = agentAt(ctx);
    const res = await api.post('/api/auth/sign-in').send({ email, password });
    expect(res.status).toBe(200);
    return { api, cookie: String(res.headers['set-cookie']).split(';')[0]! };
  }

  /** Answers once the socket has done a round trip with the server: proof it is still connected. */
  const stillConnected = (s: Socket): Promise<unknown> => new Promise((r) => s.emit('watch', `family:${randomUUID()}`, r));

  it('signing out closes the sockets of that session only', async () => {
    const me = await newTeam(ctx, { displayName: 'Two Devices' });
    const other = await secondDevice(me.email, me.password);
    const mine = await socketWith(me.cookie);
    const theirs = await socketWith(other.cookie);
    const disconnected = nextDisconnect(mine);
    expect((await me.api.post('/api/auth/sign-out')).status).toBe(204);
    expect(await disconnected).toBe('io server disconnect');
    expect(await reconnect(mine)).toMatch(/sign in/);
    // The other device's session is untouched, and so is its socket.
    expect(await stillConnected(theirs)).toEqual({ ok: false, error: 'no such object' });
    expect(theirs.connected).toBe(true);
    expect((await other.api.get('/api/auth/me')).status).toBe(200);
  });

  it('a password reset closes every socket of the account; old sessions cannot reconnect', async () => {
    const me = await newTeam(ctx, { displayName: 'Reset Sockets' });
    const other = await secondDevice(me.email, me.password);
    const sockets = [await socketWith(me.cookie), await socketWith(other.cookie)];
    const disconnected = sockets.map(nextDisconnect);
    expect((await agentAt(ctx).post('/api/auth/reset-request').send({ email: me.email })).status).toBe(202);
    const token = linkToken((await mailTo(ctx, me.email, /Reset your/)).text, '/reset-password');
    expect((await agentAt(ctx).post('/api/auth/reset').send({ token, password: 'a reset passphrase' })).status).toBe(204);
    expect(await Promise.all(disconnected)).toEqual(['io server disconnect', 'io server disconnect']);
    for (const s of sockets) expect(await reconnect(s)).toMatch(/sign in/);
  });

  it('a password change closes every socket; this session reconnects, the other device\'s cannot', async () => {
    const me = await newTeam(ctx, { displayName: 'Change Sockets' });
    const other = await secondDevice(me.email, me.password);
    const [mine, theirs] = [await socketWith(me.cookie), await socketWith(other.cookie)];
    const disconnected = [mine, theirs].map(nextDisconnect);
    expect((await me.api.post('/api/auth/password').send({ currentPassword: me.password, newPassword: 'a changed passphrase' })).status).toBe(204);
    expect(await Promise.all(disconnected)).toEqual(['io server disconnect', 'io server disconnect']);
    expect(await reconnect(mine)).toBe('connected');
    expect(await reconnect(theirs)).toMatch(/sign in/);
  });

  it('signing out everywhere closes every socket, and none reconnects', async () => {
    const me = await newTeam(ctx, { displayName: 'Everywhere Sockets' });
    const other = await secondDevice(me.email, me.password);
    const sockets = [await socketWith(me.cookie), await socketWith(other.cookie)];
    const disconnected = sockets.map(nextDisconnect);
    expect((await me.api.post('/api/auth/sign-out-everywhere')).status).toBe(204);
    expect(await Promise.all(disconnected)).toEqual(['io server disconnect', 'io server disconnect']);
    for (const s of sockets) expect(await reconnect(s)).toMatch(/sign in/);
  });
});
