import { apiErrorBodySchema, familiesResponseSchema } from '../../shared/api';
import { MaterialFamily, Team } from '../../server/db/entities';
import { demoFamilies, demoTeam, otherTeam } from '../../server/db/seed/demo-data';
import { seedDemo } from '../../server/db/seed/seed';
import { insertFamily } from '../../server/services/family-service';
import { agent, demo, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

describe('GET /api/families', () => {
  it('lists the demo team families from the database in the shared response shape', async () => {
    const res = await (await signedIn(ctx, demo.viewer)).get('/api/families');
    expect(res.status).toBe(200);
    const body = familiesResponseSchema.parse(res.body);
    expect(body.team.name).toBe(demoTeam.name);
    // Other test files add families to the same team concurrently: check the demo ones are all there.
    const seeded = body.families.filter((f) => f.isDemo);
    expect(seeded.map((f) => f.name).sort()).toEqual(demoFamilies().map((f) => f.name).sort());
    expect(seeded.find((f) => f.kind === 'table')?.carrier).toBe('p');
  });

  it('never shows another team\'s families', async () => {
    const other = await ctx.ds.getRepository(Team).findOneByOrFail({ slug: otherTeam.slug });
    const repo = ctx.ds.getRepository(MaterialFamily);
    const foreign = await insertFamily(ctx.ds.manager, other, {
      name: 'Harbour private alloy', summary: '', source: 'test', definition: { kind: 'constant', seebeck: -180e-6, sigma: 9e4, kappa: 1.4 },
    }, 'test');
    try {
      const body = familiesResponseSchema.parse((await (await signedIn(ctx, demo.viewer)).get('/api/families')).body);
      expect(body.families.map((f) => f.id)).not.toContain(foreign.id);
    } finally {
      await repo.delete(foreign.id);
    }
  });

  it('seeding twice adds nothing the second time', async () => {
    const again = await seedDemo(ctx.ds);
    expect(again).toEqual({ teams: 0, users: 0, families: 0, modules: 0, coolers: 0 });
  });
});

describe('API error shape', () => {
  it('answers an unknown route with 404 and { name, message }', async () => {
    const res = await agent(ctx).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    const body = apiErrorBodySchema.parse(res.body);
    expect(body.name).toBe('NotFound');
    expect(body.message).toContain('/no-such-thing');
  });

  it('names the body when a request carries malformed JSON', async () => {
    const res = await (await signedIn(ctx, demo.physicist)).post('/api/families').set('content-type', 'application/json').send('{"name": ');
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(res.body).errors?.[0]?.field).toBe('body');
  });

  it('serves the web app for client routes and never leaks a stack trace', async () => {
    const res = await agent(ctx).get('/materials');
    expect([200, 503]).toContain(res.status);
    expect(res.text).not.toMatch(/at .*\.ts:\d+/);
  });
});
