import { moduleResponseSchema, modulesResponseSchema } from '../../shared/api';
import { parseModuleCase, runModule } from '../../shared/engine';
import { demo, eventually, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
jest.setTimeout(120_000);
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

it('saves a module from a run and a family, resolves it to an engine case, and exports its curves', async () => {
  const api = await signedIn(ctx, demo.physicist);
  const families = (await api.get('/api/families')).body.families as Array<{ id: string; name: string; carrier: string; kind: string }>;
  const p = families.find((f) => f.name.startsWith('NL-P7 (Bi,Sb)'))!;
  const n = families.find((f) => f.carrier === 'n' && f.kind === 'band')!;
  const design = await api.post('/api/designs').send({ name: `Module leg ${Date.now()}`, familyId: p.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 5, starts: 1 });
  const runId = (await api.post(`/api/designs/${design.body.design.id}/runs`)).body.run.id as string;
  await eventually(async () => ((await api.get(`/api/runs/${runId}`)).body.run.state === 'succeeded' ? true : undefined), 60);

  const input = { name: `Detector stage ${Date.now()}`, p: { kind: 'run', runId }, n: { kind: 'family', familyId: n.id, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 }, hotSide: 300, deltaT: 30, couples: 31, currentLimit: 3 };
  const saved = await api.post('/api/modules').send(input);
  expect(saved.status).toBe(201);
  const m = moduleResponseSchema.parse(saved.body).module;
  // The stored case is exactly what the engine computes from: N couples times one couple's heat load at the same current.
  const result = runModule(parseModuleCase(m.case));
  const single = runModule(parseModuleCase({ ...m.case, couples: 1 }));
  expect(result.versusCurrent.maxHeatLoad.heatLoad).toBeCloseTo(31 * single.versusCurrent.maxHeatLoad.heatLoad, 6);
  const csv = await api.get(`/api/modules/${m.id}/curves.csv`);
  expect(csv.status).toBe(200);
  expect(csv.text).toMatch(/maximum heat load .* W at .* A/);
  expect(csv.text).toMatch(/,yes$/m); // currents above the 3 A limit are flagged

  // The list names each leg's source: the run's design, the family.
  const listed = modulesResponseSchema.parse((await api.get('/api/modules')).body).modules.find((x) => x.id === m.id)!;
  expect(listed.sourceNames).toEqual({ p: design.body.design.name, n: n.name });
  expect(listed).not.toHaveProperty('case');

  const wrongLeg = await api.post('/api/modules').send({ ...input, p: { kind: 'run', runId: '00000000-0000-4000-8000-000000000000' } });
  expect(wrongLeg.status).toBe(400);
  expect(wrongLeg.body.errors[0].field).toBe('p.runId');
  expect((await (await signedIn(ctx, demo.otherTeamAdmin)).get(`/api/modules/${m.id}`)).status).toBe(404);
});

it('seeds a demo module from the two demo band models that the engine can compute', async () => {
  const api = await signedIn(ctx, demo.viewer);
  const { modules } = modulesResponseSchema.parse((await api.get('/api/modules')).body);
  const seeded = modules.find((m) => m.name === 'Demo: detector stage, 31 uniform couples');
  expect(seeded?.sourceNames).toEqual({ p: expect.stringMatching(/^NL-P7 /), n: expect.stringMatching(/^NL-N3 /) });
  const { module } = moduleResponseSchema.parse((await api.get(`/api/modules/${seeded!.id}`)).body);
  const curve = runModule(parseModuleCase(module.case)).versusCurrent;
  // Max COP comes at a lower current than max Qc (A. F. Ioffe, Semiconductor Thermoelements, 1957).
  expect(curve.maxCop!.current).toBeLessThan(curve.maxHeatLoad.current);
  expect(curve.maxHeatLoad.heatLoad).toBeGreaterThan(0);
  // The other team does not see it.
  const other = modulesResponseSchema.parse((await (await signedIn(ctx, demo.otherTeamAdmin)).get('/api/modules')).body);
  expect(other.modules.map((m) => m.id)).not.toContain(seeded!.id);
});
