import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { roles, type Role } from '../../shared/api';
import { apiRoutes } from '../../server/http/app';
import type { RouteSpec } from '../../server/http/route-table';
import { agent, demo, eventually, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
let specs: RouteSpec[];
jest.setTimeout(120_000);
beforeAll(async () => {
  ctx = await openContext();
  specs = apiRoutes({ env: ctx.env, ds: ctx.ds, boss: ctx.boss, mailer: ctx.mailer, auth: ctx.auth, version: 'test' });
});
afterAll(async () => { await ctx.close(); });

const all = roles;
const designers: Role[] = ['admin', 'physicist'];
const admins: Role[] = ['admin'];
const runReaders: Role[] = ['admin', 'physicist', 'viewer'];

/**
 * The access policy, written out by hand from DESIGN.md's role table. The
 * route table must match it exactly: a route added without a line here, or
 * with other roles, fails this test.
 */
const policy: Record<string, 'public' | Role[]> = {
  'GET /health': 'public',
  'GET /outbox': admins,
  'POST /auth/sign-up': 'public',
  'GET /sign-up/:token': 'public',
  'POST /auth/sign-up/confirm': 'public',
  'POST /auth/sign-in': 'public',
  'POST /auth/sign-out': all.slice(),
  'POST /auth/sign-out-everywhere': all.slice(),
  'POST /auth/password': all.slice(),
  'GET /auth/me': all.slice(),
  'POST /auth/reset-request': 'public',
  'POST /auth/reset': 'public',
  'GET /invitations/:token': 'public',
  'POST /invitations/accept': 'public',
  'GET /team': all.slice(),
  'POST /team/invitations': admins,
  'DELETE /team/invitations/:id': admins,
  'PUT /team/members/:id/role': admins,
  'DELETE /team/members/:id': admins,
  'GET /audit': admins,
  'GET /audit/export.csv': admins,
  'GET /families': all.slice(),
  'POST /families': designers,
  'POST /families/upload/preview': designers,
  'POST /families/upload': designers,
  'GET /families/:id': all.slice(),
  'GET /families/:id/versions/:version': all.slice(),
  'PUT /families/:id': designers,
  'POST /families/:id/duplicate': designers,
  'POST /families/:id/archive': designers,
  'POST /families/:id/unarchive': designers,
  'GET /families/:id/export.csv': all.slice(),
  'GET /families/:id/export.json': all.slice(),
  'GET /designs': runReaders,
  'POST /designs': designers,
  'GET /designs/:id': runReaders,
  'PUT /designs/:id': designers,
  'POST /designs/:id/follow': runReaders,
  'DELETE /designs/:id/follow': runReaders,
  'POST /designs/:id/runs': designers,
  'POST /designs/:id/sweeps': designers,
  'GET /runs': runReaders,
  'GET /runs/:id': runReaders,
  'GET /runs/:id/trace': runReaders,
  'POST /runs/:id/cancel': designers,
  'GET /runs/:id/export.csv': runReaders,
  'GET /runs/:id/export.json': runReaders,
  'GET /sweeps/:id': runReaders,
  'POST /runs/:id/release': designers,
  'GET /growth-orders': all.slice(),
  'GET /growth-orders/:id': all.slice(),
  'PUT /growth-orders/:id/state': ['admin', 'grower'],
  'POST /growth-orders/:id/close': designers,
  'PUT /growth-orders/:id/sheet': designers,
  'PUT /growth-orders/:id/yield': ['admin', 'physicist', 'grower'],
  'POST /growth-orders/:id/measurements': ['admin', 'grower'],
  'GET /growth-orders/:id/sheet.csv': all.slice(),
  'GET /growth-orders/:id/sheet.json': all.slice(),
  'GET /growth-orders/:id/report.csv': all.slice(),
  'GET /modules': runReaders,
  'POST /modules': designers,
  'GET /modules/:id': runReaders,
  'PUT /modules/:id': designers,
  'DELETE /modules/:id': designers,
  'GET /modules/:id/curves.csv': runReaders,
  'GET /coolers': runReaders,
  'POST /coolers': designers,
  'GET /coolers/:id': runReaders,
  'PUT /coolers/:id': designers,
  'DELETE /coolers/:id': admins,
  'POST /coolers/:id/runs': designers,
  'GET /runs/:id/cascade.csv': runReaders,
  'GET /runs/:id/couple.csv': runReaders,
};

const key = (s: RouteSpec): string => `${s.method.toUpperCase()} ${s.path}`;

/** Ids that exist in no team: a call that gets past the gate answers 4xx from its handler, never 401/403. */
function nowhere(path: string): string {
  return `/api${path.replace(':token', 'x'.repeat(43)).replace(':version', '1').replace(':id', randomUUID())}`;
}

/** Valid bodies, so that a 404 for another team's object cannot hide behind a 400 for the body. */
const validBody: Record<string, object> = {
  'PUT /families/:id': { summary: 'changed by an outsider' },
  'POST /families/:id/duplicate': { name: 'Copied by an outsider' },
  'PUT /team/members/:id/role': { role: 'admin' },
  'PUT /designs/:id': { name: 'x', familyId: '00000000-0000-4000-8000-000000000000', lengthMm: 1, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20 },
  'POST /designs/:id/sweeps': { parameter: 'hotSide', values: [290, 300] },
  'POST /runs/:id/release': { batch: 'outsider' },
  'PUT /growth-orders/:id/state': { state: 'accepted' },
  'POST /growth-orders/:id/close': { verdict: 'rejected', reason: 'outsider' },
  'PUT /growth-orders/:id/sheet': { zones: 2 },
  'PUT /growth-orders/:id/yield': { dopingScatter: 0.07 },
  'PUT /coolers/:id': { kind: 'cascade', name: 'outsider', hotSide: 300, stages: [{ couples: 1, source: { kind: 'couple', runId: '00000000-0000-4000-8000-000000000000' } }] },
  'PUT /modules/:id': { name: 'outsider', p: { kind: 'family', familyId: '00000000-0000-4000-8000-000000000000', perCm3: 1e19, lengthMm: 1, areaMm2: 1 }, n: { kind: 'family', familyId: '00000000-0000-4000-8000-000000000000', perCm3: 1e19, lengthMm: 1, areaMm2: 1 }, hotSide: 300, deltaT: 30 },
};

function call(client: ReturnType<typeof request.agent>, s: RouteSpec, path: string) {
  return s.method === 'get' ? client.get(path) : client[s.method](path).send(validBody[key(s)] ?? {});
}

/** Routes that end every session of the caller: called as a throwaway member, never as a demo account other tests are using. */
const endsCallersSessions = new Set(['POST /auth/sign-out-everywhere']);

/** A member of the given role in a team of its own, straight into the database, with a session. */
async function throwaway(role: Role): Promise<ReturnType<typeof request.agent>> {
  const [team] = await ctx.ds.query(`INSERT INTO team (name, slug) VALUES ('Matrix throwaway', $1) RETURNING id`, [`matrix-${randomUUID()}`]);
  const id = `matrix-${randomUUID()}`;
  await ctx.ds.query(`INSERT INTO app_user (id, team_id, email, display_name, password_hash, role) VALUES ($1, $2, $3, 'Throwaway', '!', $4)`, [id, team.id, `${id}@example.test`, role]);
  const session = await ctx.auth.createSession(id, {});
  return agent(ctx).set('Cookie', ctx.auth.createSessionCookie(session.id).serialize());
}

it('every route in the table has exactly the access the policy gives it', () => {
  const table = Object.fromEntries(specs.map((s) => [key(s), s.access === 'public' ? 'public' : [...s.access].sort()]));
  const expected = Object.fromEntries(Object.entries(policy).map(([k, v]) => [k, v === 'public' ? 'public' : [...v].sort()]));
  expect(table).toEqual(expected);
});

describe.each(['anonymous', ...roles] as const)('as %s', (who) => {
  it('each route answers as the policy says', async () => {
    for (const s of specs) {
      const client = who === 'anonymous' ? agent(ctx) : endsCallersSessions.has(key(s)) ? await throwaway(who) : await signedIn(ctx, demo[who]);
      const res = await call(client, s, nowhere(s.path));
      const allowed = s.access === 'public' || (who !== 'anonymous' && s.access.includes(who));
      const expected = allowed ? 'not 401/403' : who === 'anonymous' ? 401 : 403;
      const got = allowed ? ([401, 403].includes(res.status) ? res.status : 'not 401/403') : res.status;
      expect(`${key(s)} → ${got}`).toBe(`${key(s)} → ${expected}`);
    }
  });
});

it('a member of another team gets 404 for every object of this team, and nothing changes', async () => {
  const lab = await signedIn(ctx, demo.admin);
  // The demo p-type band model: other test files add families (a constant-property one among them) that may sort first.
  const family = (await lab.get('/api/families')).body.families.find((f: { isDemo: boolean; kind: string; carrier: string }) => f.isDemo && f.kind === 'band' && f.carrier === 'p');
  const [viewer] = await ctx.ds.query('SELECT id FROM app_user WHERE email = $1', [demo.viewer]);
  const designRes = await lab.post('/api/designs').send({ name: `Matrix ${Date.now()}`, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 4, starts: 1 });
  const designId = designRes.body.design.id as string;
  const runId = (await lab.post(`/api/designs/${designId}/runs`)).body.run.id as string;
  const sweepId = (await lab.post(`/api/designs/${designId}/sweeps`).send({ parameter: 'hotSide', values: [295, 300] })).body.sweep.id as string;
  await eventually(async () => ((await lab.get(`/api/runs/${runId}`)).body.run.state === 'succeeded' ? true : undefined), 60);
  const orderId = (await lab.post(`/api/runs/${runId}/release`).send({ batch: `Matrix ${Date.now()}` })).body.order.id as string;
  // The run's leg on its own carrier's side; a band family of the other carrier at uniform doping opposite.
  const other = (await lab.get('/api/families')).body.families.find((f: { carrier: string; kind: string }) => f.carrier !== family.carrier && f.kind === 'band');
  const fromRun = { kind: 'run', runId };
  const fromFamily = { kind: 'family', familyId: other.id, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 };
  const legs = family.carrier === 'p' ? { p: fromRun, n: fromFamily } : { p: fromFamily, n: fromRun };
  const moduleRes = await lab.post('/api/modules').send({ name: `Matrix module ${Date.now()}`, ...legs, hotSide: 300, deltaT: 30, couples: 10 });
  expect(moduleRes.body.errors ?? []).toEqual([]);
  const moduleId = moduleRes.body.module.id as string;
  // The seeded demo cascade: a cooler of this team.
  const coolerId = (await lab.get('/api/coolers')).body.coolers.find((c: { name: string }) => c.name.startsWith('Demo: detector cascade')).id as string;
  const ids: Record<string, string> = { '/families/': family.id, '/team/members/': viewer.id, '/team/invitations/': randomUUID(), '/designs/': designId, '/runs/': runId, '/sweeps/': sweepId, '/growth-orders/': orderId, '/modules/': moduleId, '/coolers/': coolerId };
  for (const s of specs.filter((x) => x.path.includes(':id'))) {
    const prefix = Object.keys(ids).find((p) => s.path.startsWith(p))!;
    const outsider = await signedIn(ctx, demo.otherTeamAdmin);
    const res = await call(outsider, s, `/api${s.path.replace(':id', ids[prefix]!).replace(':version', '1')}`);
    expect(`${key(s)} → ${res.status}`).toBe(`${key(s)} → 404`);
  }
  expect((await lab.get(`/api/modules/${moduleId}`)).status).toBe(200);
  expect((await lab.get(`/api/coolers/${coolerId}`)).body.cooler.name).toMatch(/^Demo: detector cascade/);
  const after = await lab.get(`/api/families/${family.id}`);
  expect(after.body.family).toMatchObject({ version: family.version, archived: false, name: family.name });
  expect((await ctx.ds.query('SELECT role FROM app_user WHERE id = $1', [viewer.id]))[0].role).toBe('viewer');
});

it('refuses state-changing requests without the app\'s Origin, even with a valid session', async () => {
  const [row] = await ctx.ds.query('SELECT id FROM app_user WHERE email = $1', [demo.physicist]);
  const cookie = ctx.auth.createSessionCookie((await ctx.auth.createSession(row.id, {})).id).serialize();
  const body = { name: 'Cross-site', source: 'x', definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } };
  const none = await request(ctx.app).post('/api/families').set('Cookie', cookie).send(body);
  expect(none.status).toBe(403);
  const evil = await request(ctx.app).post('/api/families').set('Cookie', cookie).set('Origin', 'https://evil.example').send(body);
  expect(evil.status).toBe(403);
  expect(evil.body.message).toMatch(/evil\.example/);
});
