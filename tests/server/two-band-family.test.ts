import { randomUUID } from 'node:crypto';
import { apiErrorBodySchema, familyDetailResponseSchema, runDetailSchema, runsResponseSchema } from '../../shared/api';
import { bipolarOfProfile, type MaterialInput, type ProfileLike } from '../../shared/engine';
import { demo, eventually, openContext, signedIn, type TestContext } from './context';
import { spawnWorker, stopWorker, type SpawnedWorker } from './workers';

/**
 * A two-band (bipolar) band family end to end on the real stack: saved
 * through the API with its minority band, refused with the field named when
 * the minority band is wrong, run by a real worker, and every run summary
 * saying how much of the current minority carriers carry along the result.
 */
const queue = `test-two-band-${randomUUID().slice(0, 8)}`;
let ctx: TestContext;
let worker: SpawnedWorker;
jest.setTimeout(300_000);

beforeAll(async () => {
  ctx = await openContext({ runQueue: queue });
  worker = await spawnWorker(queue);
});
afterAll(async () => {
  await stopWorker(worker);
  await ctx.close();
});

const majority = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const minority = { effectiveMass: 1, mobility300: 600, mobilityExponent: -1.5, bandGap: 0.2, bandGapSlope: 1e-4 };

it('the demo band families are seeded with a minority band', async () => {
  const api = await signedIn(ctx, demo.viewer);
  const families = (await api.get('/api/families')).body.families as Array<{ id: string; name: string; kind: string }>;
  const bands = families.filter((f) => f.kind === 'band' && /^NL-/.test(f.name));
  expect(bands).toHaveLength(2);
  for (const f of bands) {
    const detail = familyDetailResponseSchema.parse((await api.get(`/api/families/${f.id}`)).body);
    expect(detail.current.definition).toEqual(expect.objectContaining({ minority: expect.objectContaining({ bandGap: expect.any(Number), bandGapSlope: expect.any(Number) }) }));
  }
});

it('refuses a bad minority band with a 400 naming the field, and saves nothing', async () => {
  const api = await signedIn(ctx, demo.physicist);
  const name = `Bad minority ${Date.now()}`;
  for (const [bad, field] of [
    [{ ...minority, bandGap: 170 }, 'definition.minority.bandGap'],
    [{ ...minority, mobility300: undefined }, 'definition.minority.mobility300'],
    [{ ...minority, bandGap: 0.02 }, 'definition.minority.bandGapSlope'],
    [{ ...minority, colour: 'red' }, 'definition.minority'],
  ] as const) {
    const res = await api.post('/api/families').send({ name, source: 'test: invented', definition: { ...majority, minority: bad } });
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(res.body).errors?.[0]?.field).toBe(field);
  }
  const families = (await api.get('/api/families')).body.families as Array<{ name: string }>;
  expect(families.map((f) => f.name)).not.toContain(name);
});

it('saves a two-band family, runs a design on it, and reports the minority share beside the run', async () => {
  const api = await signedIn(ctx, demo.physicist);
  const definition: MaterialInput = { ...majority, minority };
  const created = await api.post('/api/families').send({ name: `Two-band ${Date.now()}`, source: 'test: invented two-band parameters', definition });
  expect(created.status).toBe(201);
  const familyId = created.body.family.id as string;
  const stored = familyDetailResponseSchema.parse((await api.get(`/api/families/${familyId}`)).body);
  expect(stored.current.definition).toEqual(definition);

  // Doping down to 1e17 cm⁻³ on a 1.5 mm leg: the optimiser meets the bipolar region at the hot end.
  const design = await api.post('/api/designs').send({ name: `Two-band leg ${Date.now()}`, familyId, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e17, maxPerCm3: 1e20, controlPoints: 5, starts: 2 });
  expect(design.status).toBe(201);
  const launched = await api.post(`/api/designs/${design.body.design.id}/runs`);
  expect(launched.status).toBe(201);
  const runId = launched.body.run.id as string;
  expect(launched.body.run.bipolar).toBeNull();
  const done = await eventually(async () => {
    const d = runDetailSchema.parse((await api.get(`/api/runs/${runId}`)).body);
    return ['succeeded', 'failed', 'cancelled'].includes(d.run.state) ? d : undefined;
  }, 120);
  expect(done.run.error).toBeNull();
  expect(done.run.state).toBe('succeeded');
  expect((done.case.material as MaterialInput)).toEqual(definition);

  const result = done.result as { deltaT: number; profile: ProfileLike; baselines: { uniform: { deltaT: number } } };
  expect(result.deltaT).toBeGreaterThanOrEqual(result.baselines.uniform.deltaT);
  // The summary's figure is the shared function's on the stored result, and it is a real share.
  const expected = bipolarOfProfile(definition, result.profile);
  expect(expected).not.toBeNull();
  expect(done.run.bipolar).toEqual(expected);
  expect(done.run.bipolar!.share).toBeGreaterThan(0);
  expect(done.run.bipolar!.share).toBeLessThan(1);
  expect(done.run.bipolar!.bipolar).toBe(done.run.bipolar!.share > 0.05);
  // The largest share sits at the hot, lightly doped end.
  expect(done.run.bipolar!.temperature).toBeCloseTo(300, 3);

  const listed = runsResponseSchema.parse((await api.get(`/api/runs?designId=${design.body.design.id}`)).body).runs.find((r) => r.id === runId);
  expect(listed?.bipolar).toEqual(expected);
});
