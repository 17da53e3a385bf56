import type { Socket } from 'socket.io-client';
import { roles, type Role } from '../../shared/api';
import { apiRoutes } from '../../server/http/app';
import { objectReaders, type ObjectKind } from '../../server/http/object-access';
import { watchableKinds } from '../../server/realtime/watch-rules';
import { demo, eventually, openContext, signedIn, type TestContext } from './context';
import { cookieFor, socketServer, type SocketServer } from './sockets';

/**
 * One rule decides who may read an object over HTTP and who may watch its
 * room over a socket. Checked both ways: the watch rules and the route
 * table take their roles from the same table, and for every role and every
 * watchable kind a real watch answers as the real GET does.
 */
let ctx: TestContext;
let realtime: SocketServer;
const ids = {} as Record<ObjectKind, string>;
jest.setTimeout(240_000);

/** The HTTP route that reads one object of each watchable kind. */
const detailPath: Partial<Record<ObjectKind, string>> = { family: '/families/:id', design: '/designs/:id', run: '/runs/:id', sweep: '/sweeps/:id', growth: '/growth-orders/:id' };

beforeAll(async () => {
  ctx = await openContext();
  realtime = await socketServer(ctx);
  // One object of each kind in the demo lab.
  const lab = await signedIn(ctx, demo.admin);
  const family = (await lab.get('/api/families')).body.families.find((f: { isDemo: boolean; kind: string; carrier: string }) => f.isDemo && f.kind === 'band' && f.carrier === 'p');
  ids.family = family.id;
  ids.design = (await lab.post('/api/designs').send({ name: `Watch ${Date.now()}`, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 4, starts: 1 })).body.design.id;
  ids.run = (await lab.post(`/api/designs/${ids.design}/runs`)).body.run.id;
  ids.sweep = (await lab.post(`/api/designs/${ids.design}/sweeps`).send({ parameter: 'hotSide', values: [295, 300] })).body.sweep.id;
  await eventually(async () => ((await lab.get(`/api/runs/${ids.run}`)).body.run.state === 'succeeded' ? true : undefined), 120);
  ids.growth = (await lab.post(`/api/runs/${ids.run}/release`).send({ batch: `Watch ${Date.now()}` })).body.order.id;
});
afterAll(async () => {
  await realtime.close();
  await ctx.close();
});

const socketAs = async (email: string): Promise<Socket> => realtime.open(await cookieFor(ctx, email));

const watch = (s: Socket, room: string) => new Promise<{ ok: boolean }>((r) => s.emit('watch', room, r));

it('every watchable kind has its reading route, and both take their roles from one table', () => {
  const specs = apiRoutes({ env: ctx.env, ds: ctx.ds, boss: ctx.boss, mailer: ctx.mailer, auth: ctx.auth, version: 'test' });
  for (const kind of watchableKinds) {
    const spec = specs.find((s) => s.method === 'get' && s.path === detailPath[kind]);
    expect(spec).toBeDefined();
    expect(`${kind}: ${spec!.access === 'public' ? 'public' : [...spec!.access].sort().join(',')}`).toBe(`${kind}: ${[...objectReaders[kind]].sort().join(',')}`);
  }
});

describe.each(roles.map((r) => [r] as [Role]))('as %s', (role) => {
  it('may watch exactly the rooms whose object it may GET', async () => {
    const socket = await socketAs(demo[role]);
    const api = await signedIn(ctx, demo[role]);
    for (const kind of watchableKinds) {
      const status = (await api.get(`/api${detailPath[kind]!.replace(':id', ids[kind])}`)).status;
      expect([200, 403]).toContain(status);
      const { ok } = await watch(socket, `${kind}:${ids[kind]}`);
      expect(`${kind}: watch ${ok}, GET ${status}`).toBe(`${kind}: watch ${status === 200}, GET ${status}`);
    }
  });
});

it('a grower may watch a growth order but not the run it came from, nor its design or sweep', async () => {
  const grower = await socketAs(demo.grower);
  expect(await watch(grower, `growth:${ids.growth}`)).toEqual({ ok: true });
  for (const kind of ['run', 'design', 'sweep'] as const) expect(await watch(grower, `${kind}:${ids[kind]}`)).toEqual({ ok: false, error: 'no such object' });
  const viewer = await socketAs(demo.viewer);
  expect(await watch(viewer, `run:${ids.run}`)).toEqual({ ok: true });
});
