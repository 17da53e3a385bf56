import { randomUUID } from 'node:crypto';
import {
  cascadeResultSchema, coolerResponseSchema, coolerRunDetailSchema, coolerSearchSchema, coolersResponseSchema, coupleResultSchema, runsResponseSchema, runSummarySchema,
  type CoolerRunDetail,
} from '../../shared/api';
import { demo, eventually, mailTo, openContext, signedIn, type TestContext } from './context';
import { expectCellOf, oneLine, readSafeCsv } from './csv-safety';
import { checkpointHolder, spawnWorker, stopWorker, type SpawnedWorker } from './workers';

/**
 * Matched couples and cascades against the real stack: saved through the
 * API (sources resolved, the engine's check, fields named in the user's
 * words), launched on the leg runs' queue to private workers, their results
 * read with the contract's schemas, mailed, exported as CSV, cancelled, and
 * resumed from a checkpoint after their worker is killed. Legs are of
 * constant-property families, so each run takes seconds.
 */
const queue = `test-coolers-${randomUUID().slice(0, 8)}`;
let ctx: TestContext;
let workers: SpawnedWorker[] = [];
jest.setTimeout(300_000);

type Api = Awaited<ReturnType<typeof signedIn>>;
const stamp = Date.now();
let legs: { p: Record<string, unknown>; n: Record<string, unknown> };

beforeAll(async () => {
  ctx = await openContext({ runQueue: queue });
  workers = await Promise.all([spawnWorker(queue), spawnWorker(queue)]);
  const api = await signedIn(ctx, demo.physicist);
  // Textbook constant-property legs: S = ±200 µV/K, σ = 1000 S/cm, κ = 1.5 W/(m·K).
  const family = async (name: string, seebeck: number): Promise<string> => {
    const res = await api.post('/api/families').send({ name: `${name} ${stamp}`, source: 'Test data: round numbers.', definition: { kind: 'constant', seebeck, sigma: 1e5, kappa: 1.5 } });
    expect(res.status).toBe(201);
    return res.body.family.id as string;
  };
  const leg = (familyId: string) => ({ kind: 'family', familyId, perCm3: 1e19, lengthMm: 1.5, areaMm2: 1 });
  legs = { p: leg(await family('Cooler test p', 200e-6)), n: leg(await family('Cooler test n', -200e-6)) };
});
afterAll(async () => {
  await Promise.all(workers.map(stopWorker));
  await ctx.close();
});

const couple = (name: string, extra: Record<string, unknown> = {}) => ({ kind: 'couple', name, p: legs.p, n: legs.n, hotSide: 300, starts: 2, ...extra });
const cascade = (name: string, extra: Record<string, unknown> = {}) => ({
  kind: 'cascade', name, hotSide: 300, heatLoad: 0.002, wiring: 'series', starts: 1,
  stages: [{ couples: 4, source: { kind: 'legs', ...legs }, interfaceResistance: 0.05 }, { couples: 12, source: { kind: 'legs', ...legs } }],
  couplesLimit: { kind: 'total', total: 16 },
  ...extra,
});

async function save(api: Api, body: object): Promise<string> {
  const res = await api.post('/api/coolers').send(body);
  expect(res.body.errors ?? []).toEqual([]);
  expect(res.status).toBe(201);
  return coolerResponseSchema.parse(res.body).cooler.id;
}

const finished = (api: Api, runId: string, seconds = 120) => eventually(async () => {
  const d = coolerRunDetailSchema.parse((await api.get(`/api/runs/${runId}`)).body);
  return ['succeeded', 'failed', 'cancelled'].includes(d.run.state) ? d : undefined;
}, seconds);

/** One CSV file of several tables, each read back as a spreadsheet would. */
const tablesOf = (body: string, words: string[] = []) => body.split('\n\n').map((part, i, all) => readSafeCsv(i < all.length - 1 ? `${part}\n` : part, words));

describe('saving coolers', () => {
  it('creates, reads, lists, renames and deletes (admin only), and keeps its kind', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const id = await save(api, couple(`Couple CRUD ${stamp}`));
    const got = coolerResponseSchema.parse((await api.get(`/api/coolers/${id}`)).body).cooler;
    expect(got).toMatchObject({ kind: 'couple', name: `Couple CRUD ${stamp}`, createdBy: 'Piet Okafor' });
    // The case is the engine's, in SI: mm → m, mm² → m², the legs' material frozen from the family.
    expect(got.case).toMatchObject({ hotSide: 300, objective: 'maxDeltaT', heatLoad: 0, p: { length: 1.5e-3, area: 1e-6, material: { kind: 'constant', seebeck: 200e-6 } } });
    expect(got.case).not.toHaveProperty('areaRatio');
    const list = coolersResponseSchema.parse((await api.get('/api/coolers')).body).coolers;
    expect(list.find((c) => c.id === id)).toMatchObject({ latestRun: null });
    expect(list.some((c) => c.name.startsWith('Demo: detector cascade') && c.kind === 'cascade')).toBe(true);
    const renamed = await api.put(`/api/coolers/${id}`).send(couple(`Couple renamed ${stamp}`, { areaRatio: 1.2 }));
    expect(renamed.status).toBe(200);
    expect(renamed.body.cooler.case).toMatchObject({ areaRatio: 1.2, n: { length: 1.5e-3 } });
    expect(renamed.body.cooler.case.n).not.toHaveProperty('area');
    const otherKind = await api.put(`/api/coolers/${id}`).send(cascade(`x ${stamp}`));
    expect(otherKind.status).toBe(400);
    expect(otherKind.body.errors[0].field).toBe('kind');
    expect((await api.delete(`/api/coolers/${id}`)).status).toBe(403);
    const admin = await signedIn(ctx, demo.admin);
    expect((await admin.delete(`/api/coolers/${id}`)).status).toBe(204);
    expect((await api.get(`/api/coolers/${id}`)).status).toBe(404);
  });

  it('refuses bad input naming the field in the user’s words', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const zero = await api.post('/api/coolers').send(cascade(`Zero ${stamp}`, { stages: [{ couples: 0, source: { kind: 'legs', ...legs } }] }));
    expect(zero.status).toBe(400);
    expect(zero.body.errors[0]).toEqual({ field: 'stages[0].couples', message: expect.stringMatching(/^Couples N must be at least 1/) });
    const stage = { couples: 2, source: { kind: 'legs', ...legs } };
    const five = await api.post('/api/coolers').send(cascade(`Five ${stamp}`, { stages: [stage, stage, stage, stage, stage] }));
    expect(five.status).toBe(400);
    expect(five.body.errors[0]).toEqual({ field: 'stages', message: 'a cascade has at most 4 stages' });
    const noCold = await api.post('/api/coolers').send(cascade(`Least power ${stamp}`, { objective: 'minPower' }));
    expect(noCold.status).toBe(400);
    expect(noCold.body.errors).toEqual([{ field: 'coldSide', message: 'Cold-side target Tc is required for the least-power objective' }]);
    // Another team's run is no source: as a stage's couple, and as a leg.
    const outsider = await signedIn(ctx, demo.otherTeamAdmin);
    const band = { kind: 'band', carrier: 'p', effectiveMass: 1.0, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1.0, latticeKappaExponent: -1 };
    const fam = await outsider.post('/api/families').send({ name: `Outsider ${stamp}`, source: 'Test data: a one-band model.', definition: band });
    expect(fam.status).toBe(201);
    const design = await outsider.post('/api/designs').send({ name: `Outsider ${stamp}`, familyId: fam.body.family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 2, starts: 1 });
    expect(design.status).toBe(201);
    const theirs = (await outsider.post(`/api/designs/${design.body.design.id}/runs`)).body.run.id as string;
    const asStage = await api.post('/api/coolers').send(cascade(`Theirs ${stamp}`, { stages: [{ couples: 2, source: { kind: 'couple', runId: theirs } }] }));
    expect(asStage.status).toBe(400);
    expect(asStage.body.errors).toEqual([{ field: 'stages[0].source.runId', message: 'no such run in this team' }]);
    const asDesign = await api.post('/api/coolers').send(couple(`Theirs ${stamp}`, { p: { kind: 'design', designId: design.body.design.id } }));
    expect(asDesign.status).toBe(400);
    expect(asDesign.body.errors).toEqual([{ field: 'p.designId', message: 'no such leg design in this team' }]);
    // The engine's own refusal lands on the input's field: an n-type family as the p leg.
    const swapped = await api.post('/api/coolers').send(couple(`Swapped ${stamp}`, { p: legs.n }));
    expect(swapped.status).toBe(400);
    expect(swapped.body.errors[0].field).toBe('p');
    expect(swapped.body.message).toMatch(/p-type/);
  });
});

describe('cooler runs', () => {
  it('a cascade run: queued like a leg run, solved by a worker, read, listed, mailed and exported with units', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const name = `=1+1,"quoted"\n@SUM(1) cascade ${stamp}`;
    const id = await save(api, cascade(name));
    const launched = await api.post(`/api/coolers/${id}/runs`);
    expect(launched.status).toBe(201);
    const run = runSummarySchema.parse(launched.body.run);
    expect(run).toMatchObject({ kind: 'cascade', coolerId: id, designId: null, designName: name.trim(), state: 'queued', starts: 1 });
    const done: CoolerRunDetail = await finished(api, run.id);
    expect(done.run.state).toBe('succeeded');
    expect(done.cooler.id).toBe(id);
    const result = cascadeResultSchema.extend({ search: coolerSearchSchema }).parse(done.result);
    expect(result.stages).toHaveLength(2);
    expect(result.stages.reduce((a, s) => a + s.couples, 0)).toBe(16);
    // The heat a stage rejects is the load of the next warmer stage; the headline is the result's.
    expect(result.stages[1]!.heatLoad).toBeCloseTo(result.stages[0]!.heatRejected, 6);
    expect(done.run.deltaT).toBeCloseTo(result.deltaT, 9);
    expect(done.run.best).toBeCloseTo(result.deltaT, 9);
    expect(result.search).toEqual({ startsDone: 1, bestStart: 0, starts: 1 });
    const listed = runsResponseSchema.parse((await api.get(`/api/runs?coolerId=${id}`)).body).runs;
    expect(listed.map((r) => r.id)).toEqual([run.id]);
    expect(coolersResponseSchema.parse((await api.get('/api/coolers')).body).coolers.find((c) => c.id === id)?.latestRun).toMatchObject({ id: run.id, state: 'succeeded', deltaT: result.deltaT });

    const mail = await mailTo(ctx, demo.physicist, new RegExp(`^Cascade run ${run.number} finished`));
    expect(mail.subject).toMatch(/cold side \d+\.\d K, ΔT \d+\.\d K/);
    expect(mail.text).toMatch(/input power \d+\.\d+ W, COP/);
    expect(mail.text).toContain('model predictions');
    expect(mail.text).toContain(`/runs/${run.id}`);

    const csv = await api.get(`/api/runs/${run.id}/cascade.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const [stages, curves] = tablesOf(csv.text, ['total']);
    expect(stages!.header).toEqual(['stage (1 = coldest)', 'couples', 'cold_side_K', 'hot_side_K', 'current_A', 'voltage_V', 'power_W', 'heat_load_W', 'heat_rejected_W']);
    expectCellOf(stages!.comments[0]!, oneLine(name.trim()));
    expect(stages!.rows.map((r) => r[0])).toEqual(['1', '2', 'total']);
    expect(Number(stages!.rows[2]![6])).toBeCloseTo(result.power, 5);
    expect(curves!.header).toEqual(['stages', 'cold_side_K', 'heat_load_W', 'power_W']);
    expect(curves!.rows.length).toBeGreaterThan(1);
    expect((await api.get(`/api/runs/${run.id}/couple.csv`)).status).toBe(409);
    expect((await api.get(`/api/runs/${run.id}/export.csv`)).text).toBe(csv.text);

    // What assumed a design refuses a cascade run, saying why.
    const release = await api.post(`/api/runs/${run.id}/release`).send({ batch: `Cascade ${stamp}` });
    expect(release.status).toBe(409);
    expect(release.body.message).toMatch(/release the leg runs/);
    const asLeg = await api.post('/api/modules').send({ name: `From cascade ${stamp}`, p: { kind: 'run', runId: run.id }, n: legs.n, hotSide: 300, deltaT: 30 });
    expect(asLeg.status).toBe(400);
    expect(asLeg.body.errors[0].field).toBe('p.runId');
    // A finished run of a cooler keeps it from nothing: deleting the cooler takes its finished runs along.
    expect((await (await signedIn(ctx, demo.admin)).delete(`/api/coolers/${id}`)).status).toBe(204);
    expect((await api.get(`/api/runs/${run.id}`)).status).toBe(404);
  });

  it('a couple run: the area ratio and current optimised, its legs a cascade stage, mailed and exported', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const id = await save(api, couple(`Couple run ${stamp}`, { notes: 'free ratio' }));
    const run = runSummarySchema.parse((await api.post(`/api/coolers/${id}/runs`)).body.run);
    expect(run.kind).toBe('couple');
    const done = await finished(api, run.id);
    expect(done.run.state).toBe('succeeded');
    const result = coupleResultSchema.extend({ search: coolerSearchSchema }).parse(done.result);
    // Two legs of the same constant material but opposite sign: matched at equal areas.
    expect(result.areaRatio).toBeCloseTo(1, 2);
    expect(result.deltaT).toBeGreaterThan(0);
    expect(done.run.best).toBeCloseTo(result.objective.value, 9);
    const mail = await mailTo(ctx, demo.physicist, new RegExp(`^Matched-couple run ${run.number} finished`));
    expect(mail.text).toMatch(/area ratio A_n \/ A_p \d\.\d{3}; one shared current costs/);
    const tables = tablesOf((await api.get(`/api/runs/${run.id}/couple.csv`)).text, ['p', 'n', 'yes', 'no']);
    expect(tables[0]!.header).toEqual(expect.arrayContaining(['deltaT_K', 'heat_load_W', 'current_A', 'area_ratio_n_over_p', 'mismatch_cost_K']));
    expect(tables[1]!.rows.map((r) => r[0])).toEqual(['p', 'n']);
    // Its legs feed a cascade stage.
    const stage = await save(api, cascade(`From couple ${stamp}`, { couplesLimit: null, stages: [{ couples: 3, source: { kind: 'couple', runId: run.id } }, { couples: 9, source: { kind: 'legs', ...legs } }] }));
    const c = coolerResponseSchema.parse((await api.get(`/api/coolers/${stage}`)).body).cooler.case as { stages: Array<{ p: { area: number } }> };
    expect(c.stages[0]!.p.area).toBeCloseTo(result.p.area, 12);
  });

  it('cancel stops a cooler run and keeps its best so far; a viewer may neither launch nor cancel', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const id = await save(api, cascade(`Cancelled ${stamp}`, { starts: 500 }));
    expect((await (await signedIn(ctx, demo.viewer)).post(`/api/coolers/${id}/runs`)).status).toBe(403);
    const runId = (await api.post(`/api/coolers/${id}/runs`)).body.run.id as string;
    await eventually(async () => ((await api.get(`/api/runs/${runId}`)).body.progress ? true : undefined), 60);
    expect((await (await signedIn(ctx, demo.viewer)).post(`/api/runs/${runId}/cancel`)).status).toBe(403);
    expect((await api.post(`/api/runs/${runId}/cancel`)).status).toBe(200);
    const done = await finished(api, runId, 60);
    expect(done.run.state).toBe('cancelled');
    expect((await api.post(`/api/runs/${runId}/cancel`)).status).toBe(409);
  });

  it('a cooler run whose worker is killed with SIGKILL resumes from its checkpoint and succeeds on its second attempt', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const id = await save(api, cascade(`Killed ${stamp}`, { starts: 200 }));
    const runId = (await api.post(`/api/coolers/${id}/runs`)).body.run.id as string;
    const held = await checkpointHolder(ctx.ds, workers, runId);
    const victim = held.victim!;
    expect(victim).toBeDefined();
    victim.child.kill('SIGKILL');
    workers = workers.filter((w) => w !== victim);
    workers.push(await spawnWorker(queue));
    const done = await finished(api, runId, 240);
    expect(done.run.state).toBe('succeeded');
    expect(done.run.attempts).toBe(2);
    const [row] = await ctx.ds.query('SELECT worker_id FROM run WHERE id = $1', [runId]);
    expect(row.worker_id).not.toBe(held.workerId);
    // Every start done once, the ones before the kill taken from the checkpoint.
    expect(cascadeResultSchema.extend({ search: coolerSearchSchema }).parse(done.result).search).toMatchObject({ startsDone: 200, starts: 200 });
  });
});
