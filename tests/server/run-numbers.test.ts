/**
 * Run numbers ("Run 12"): one sequence per team, given at launch, distinct
 * when launches race, never given twice. No worker takes this file's queue:
 * the runs stay queued, numbering is all that is looked at.
 */
import { randomUUID } from 'node:crypto';
import { runsResponseSchema, runSummarySchema, sweepSchema } from '../../shared/api';
import { RunNumbers1764655200000 } from '../../server/db/migrations/1764655200000-run-numbers';
import { demo, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
jest.setTimeout(120_000);

beforeAll(async () => {
  const base = await openContext();
  const fairShare = { ...base.env.fairShare, launchesPerMinute: 12, unfinishedLimit: 100 };
  await base.close();
  ctx = await openContext({ runQueue: `test-numbers-${randomUUID().slice(0, 8)}`, fairShare });
});
afterAll(async () => {
  // Leave no queued run behind for other files' workers to count.
  await ctx.ds.query(`UPDATE run SET state = 'cancelled', finished_at = now(), job_id = NULL WHERE queue = $1`, [ctx.env.runQueue]);
  await ctx.close();
});

type Api = Awaited<ReturnType<typeof signedIn>>;

/** The benchmark band family, parameters invented; each team gets its own copy. */
const band = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;

async function design(api: Api, name: string, starts: number): Promise<string> {
  const family = await api.post('/api/families').send({ name: `Band for ${name}`, source: 'test: invented parameters', summary: 'v1', definition: band });
  expect(family.status).toBe(201);
  const res = await api.post('/api/designs').send({ name, familyId: family.body.family.id as string, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 6, starts });
  expect(res.status).toBe(201);
  return res.body.design.id as string;
}

const lastNumber = async (teamEmail: string): Promise<number> => {
  const [row] = (await ctx.ds.query('SELECT t.last_run_number AS n FROM team t JOIN app_user u ON u.team_id = t.id WHERE u.email = $1', [teamEmail])) as Array<{ n: number }>;
  return row!.n;
};

it('launches at the same moment get distinct, consecutive numbers of their own team; another team counts on its own', async () => {
  const piet = await signedIn(ctx, demo.physicist);
  const hana = await signedIn(ctx, demo.otherTeamAdmin);
  const mine = await design(piet, `Numbered ${Date.now()}`, 3);
  const theirs = await design(hana, `Harbour numbered ${Date.now()}`, 150);
  const before = await lastNumber(demo.physicist);
  const otherBefore = await lastNumber(demo.otherTeamAdmin);
  const launches = await Promise.all([
    ...Array.from({ length: 6 }, () => piet.post(`/api/designs/${mine}/runs`)),
    ...Array.from({ length: 3 }, () => hana.post(`/api/designs/${theirs}/runs`)),
  ]);
  expect(launches.map((r) => r.status)).toEqual(Array(9).fill(201));
  const runs = launches.map((r) => runSummarySchema.parse(r.body.run));
  const numbers = (from: number, to: number) => runs.slice(from, to).map((r) => r.number).sort((a, b) => a - b);
  expect(numbers(0, 6)).toEqual([1, 2, 3, 4, 5, 6].map((k) => before + k));
  expect(numbers(6, 9)).toEqual([1, 2, 3].map((k) => otherBefore + k));
  // What tells two runs apart travels with each: starts and who launched it, by name.
  expect(runs[0]).toMatchObject({ starts: 3, launchedBy: 'Piet Okafor' });
  expect(runs[6]!.starts).toBe(150);
  // The list says the same numbers.
  const listed = runsResponseSchema.parse((await piet.get(`/api/runs?designId=${mine}`)).body).runs;
  expect(listed.map((r) => r.number).sort((a, b) => a - b)).toEqual(numbers(0, 6));
});

it('a sweep numbers its runs in the same sequence, and a refused launch gives no number away', async () => {
  const piet = await signedIn(ctx, demo.physicist);
  const id = await design(piet, `Swept numbers ${Date.now()}`, 2);
  const before = await lastNumber(demo.physicist);
  const sweep = await piet.post(`/api/designs/${id}/sweeps`).send({ parameter: 'hotSide', values: [290, 300, 310] });
  expect(sweep.status).toBe(201);
  expect(sweepSchema.parse(sweep.body.sweep).runs.map((r) => r.number).sort((a, b) => a - b)).toEqual([before + 1, before + 2, before + 3]);
  // Over the launch limit: refused, and the next launch still gets the next number.
  const tooMany = await piet.post(`/api/designs/${id}/sweeps`).send({ parameter: 'hotSide', values: Array.from({ length: 40 }, (_, k) => 250 + k) });
  expect(tooMany.status).toBe(429);
  const next = await piet.post(`/api/designs/${id}/runs`);
  expect(runSummarySchema.parse(next.body.run).number).toBe(before + 4);
});

it('the migration numbers existing runs per team in launch order and the counter continues after them', async () => {
  const qr = ctx.ds.createQueryRunner();
  try {
    const migration = new RunNumbers1764655200000();
    await migration.down(qr);
    await migration.up(qr);
  } finally {
    await qr.release();
  }
  const rows = (await ctx.ds.query(`SELECT team_id, number, row_number() OVER (PARTITION BY team_id ORDER BY created_at, id)::int AS k FROM run`)) as Array<{ team_id: string; number: number; k: number }>;
  expect(rows.length).toBeGreaterThan(9);
  expect(rows.filter((r) => r.number !== r.k)).toEqual([]);
  const counters = (await ctx.ds.query(`SELECT t.last_run_number AS n, (SELECT count(*)::int FROM run WHERE team_id = t.id) AS runs FROM team t`)) as Array<{ n: number; runs: number }>;
  expect(counters.filter((c) => c.n !== c.runs)).toEqual([]);
  const piet = await signedIn(ctx, demo.physicist);
  const id = await design(piet, `After backfill ${Date.now()}`, 1);
  const before = await lastNumber(demo.physicist);
  expect(runSummarySchema.parse((await piet.post(`/api/designs/${id}/runs`)).body.run).number).toBe(before + 1);
});
