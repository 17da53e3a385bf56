import * as passwords from '../../server/auth/passwords';
import { agent, agentAt, anAddress, fresh, mailTo, newTeam, openContext, tokenIn, type TestContext } from './context';

/**
 * Every anonymous route that costs work answers 429 once its limit for one
 * network address is spent (naming the limit, with Retry-After), and a link
 * is checked before any password is hashed: a bad one costs no argon2 time.
 * Each case comes from an address of its own (X-Forwarded-For through the
 * trusted loopback proxy), so no other test's requests count against it.
 */
let ctx: TestContext;
jest.setTimeout(180_000);
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });
afterEach(() => jest.restoreAllMocks());

const badToken = 'x'.repeat(43);
const password = 'a long enough passphrase';

type Case = { route: string; max: number; send: (ip: string, i: number) => Promise<{ status: number; body: { message?: string }; headers: Record<string, string> }> };

const cases: Case[] = [
  { route: 'POST /auth/sign-up', max: 10, send: (ip, i) => agentAt(ctx, ip).post('/api/auth/sign-up').send({ email: fresh(`limit${i}`), displayName: 'Limit', teamName: 'Limit lab' }) },
  { route: 'GET /sign-up/:token', max: 120, send: (ip) => agentAt(ctx, ip).get(`/api/sign-up/${badToken}`) },
  { route: 'POST /auth/sign-up/confirm', max: 60, send: (ip) => agentAt(ctx, ip).post('/api/auth/sign-up/confirm').send({ token: badToken, password }) },
  { route: 'POST /auth/reset-request', max: 20, send: (ip, i) => agentAt(ctx, ip).post('/api/auth/reset-request').send({ email: fresh(`limit${i}`) }) },
  { route: 'POST /auth/reset', max: 60, send: (ip) => agentAt(ctx, ip).post('/api/auth/reset').send({ token: badToken, password }) },
  { route: 'GET /invitations/:token', max: 120, send: (ip) => agentAt(ctx, ip).get(`/api/invitations/${badToken}`) },
  { route: 'POST /invitations/accept', max: 60, send: (ip) => agentAt(ctx, ip).post('/api/invitations/accept').send({ token: badToken, password, displayName: 'Limit' }) },
];

it.each(cases)('$route answers 429 from one address past its limit ($max), naming it, with Retry-After', async ({ max, send }) => {
  const ip = anAddress();
  const statuses: number[] = [];
  for (let i = 0; i < max; i += 1) statuses.push((await send(ip, i)).status);
  expect(statuses.filter((s) => s === 429)).toEqual([]);
  const refused = await send(ip, max);
  expect(refused.status).toBe(429);
  expect(refused.body.message).toMatch(new RegExp(`at most ${max} .* from one network address in an hour; try again in \\d+ minutes`));
  const retryAfter = Number(refused.headers['retry-after']);
  expect(retryAfter).toBeGreaterThan(0);
  expect(retryAfter).toBeLessThanOrEqual(3600);
  // Another address is not held back.
  expect((await send(anAddress(), max + 1)).status).not.toBe(429);
});

it('the sign-in limit per address holds as well (40 in 15 minutes)', async () => {
  const ip = anAddress();
  // Pre-spend 40 hits of this address's counter directly: 40 real refusals would spend 40 argon2 verifications.
  await ctx.ds.query(`INSERT INTO rate_limit_hit (key) SELECT $1 FROM generate_series(1, 40)`, [`signin:address:${ip}`]);
  const refused = await agentAt(ctx, ip).post('/api/auth/sign-in').send({ email: fresh('nobody'), password: 'anything at all' });
  expect(refused.status).toBe(429);
  expect(refused.body.message).toMatch(/at most 40 sign-in attempts from one network address in 15 minutes/);
  expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
});

describe('a bad link is refused before any password is hashed', () => {
  const routes = [
    { path: '/api/auth/reset', body: { token: badToken, password } },
    { path: '/api/invitations/accept', body: { token: badToken, password, displayName: 'Nobody' } },
    { path: '/api/auth/sign-up/confirm', body: { token: badToken, password } },
  ];

  it.each(routes)('$path: 400 naming `token`, and hashPassword is never called', async ({ path, body }) => {
    const hash = jest.spyOn(passwords, 'hashPassword');
    const res = await agentAt(ctx).post(path).send(body);
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([{ field: 'token', message: expect.stringMatching(/invalid, used/) }]);
    expect(hash).not.toHaveBeenCalled();
  });

  it('while a live link does hash (so the spy above would have seen it)', async () => {
    const email = fresh('live.link');
    expect((await agentAt(ctx).post('/api/auth/sign-up').send({ email, displayName: 'Live', teamName: 'Live lab' })).status).toBe(202);
    const token = tokenIn((await mailTo(ctx, email, /Finish creating/)).text, '/confirm-sign-up');
    const hash = jest.spyOn(passwords, 'hashPassword');
    expect((await agentAt(ctx).post('/api/auth/sign-up/confirm').send({ token, password })).status).toBe(201);
    expect(hash).toHaveBeenCalledTimes(1);
  });

  it('a used link is refused before hashing too', async () => {
    const { email } = await newTeam(ctx);
    await agentAt(ctx).post('/api/auth/reset-request').send({ email });
    const token = tokenIn((await mailTo(ctx, email, /Reset your/)).text, '/reset-password');
    expect((await agentAt(ctx).post('/api/auth/reset').send({ token, password: 'the first new passphrase' })).status).toBe(204);
    const hash = jest.spyOn(passwords, 'hashPassword');
    expect((await agent(ctx).post('/api/auth/reset').send({ token, password: 'a second new passphrase' })).status).toBe(400);
    expect(hash).not.toHaveBeenCalled();
  });
});

describe('invitations per team', () => {
  it('at most 20 a day: the 21st answers 429 naming the limit, with Retry-After, and mails nothing', async () => {
    const { api } = await newTeam(ctx, { teamName: 'Busy inviters' });
    for (let i = 0; i < 20; i += 1) expect((await api.post('/api/team/invitations').send({ email: fresh(`daily${i}`), role: 'viewer' })).status).toBe(201);
    const extra = fresh('daily.extra');
    const refused = await api.post('/api/team/invitations').send({ email: extra, role: 'viewer' });
    expect(refused.status).toBe(429);
    expect(refused.body.errors).toEqual([{ field: 'email', message: 'at most 20 invitations a day per team' }]);
    expect(refused.body.message).toMatch(/sent 20 invitations in the last 24 hours/);
    const retryAfter = Number(refused.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(23 * 3600);
    expect(retryAfter).toBeLessThanOrEqual(24 * 3600);
    expect(await ctx.ds.query('SELECT 1 FROM invitation WHERE email = $1', [extra])).toEqual([]);
    // Revoking does not give the day's mail back.
    const team = (await api.get('/api/team')).body as { invitations: Array<{ id: string }> };
    expect((await api.delete(`/api/team/invitations/${team.invitations[0]!.id}`)).status).toBe(204);
    expect((await api.post('/api/team/invitations').send({ email: extra, role: 'viewer' })).status).toBe(429);
  });

  it('at most 50 pending at once: refused until one is revoked', async () => {
    const { api, teamId, userId } = await newTeam(ctx, { teamName: 'Patient inviters' });
    // 50 pending invitations sent two days ago (out of the daily window), straight into the database.
    await ctx.ds.query(
      `INSERT INTO invitation (team_id, email, role, token_hash, invited_by, created_at, expires_at)
       SELECT $1, 'pending' || g || '.' || $3 || '@example.test', 'viewer', md5(random()::text || g), $2, now() - interval '2 days', now() + interval '5 days'
       FROM generate_series(1, 50) g`, [teamId, userId, Date.now()]);
    const refused = await api.post('/api/team/invitations').send({ email: fresh('one.more'), role: 'viewer' });
    expect(refused.status).toBe(429);
    expect(refused.body.errors).toEqual([{ field: 'email', message: 'at most 50 pending invitations per team' }]);
    expect(refused.body.message).toMatch(/50 pending invitations, the most it may hold: revoke some/);
    const retryAfter = Number(refused.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(4 * 86400);
    expect(retryAfter).toBeLessThanOrEqual(5 * 86400);
    const [one] = await ctx.ds.query('SELECT id FROM invitation WHERE team_id = $1 LIMIT 1', [teamId]);
    expect((await api.delete(`/api/team/invitations/${one.id}`)).status).toBe(204);
    expect((await api.post('/api/team/invitations').send({ email: fresh('one.more'), role: 'viewer' })).status).toBe(201);
  });
});
