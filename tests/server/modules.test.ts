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
  const launched = (await api.post(`/api/designs/${design.body.design.id}/runs`)).body.run as { id: string; number: number };
  const runId = launched.id;
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

  // The list names each leg's source: the run by its number and design, the family.
  const listed = modulesResponseSchema.parse((await api.get('/api/modules')).body).modules.find((x) => x.id === m.id)!;
  expect(listed.sourceNames).toEqual({ p: `Run ${launched.number} · ${design.body.design.name}`, n: n.name });
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

it('exports the curve versus ΔT as CSV: ΔT rising to the module’s ΔTmax, Qc falling to zero there', async () => {
  const api = await signedIn(ctx, demo.viewer);
  const { modules } = modulesResponseSchema.parse((await api.get('/api/modules')).body);
  const seeded = modules.find((m) => m.name === 'Demo: detector stage, 31 uniform couples')!;
  const res = await api.get(`/api/modules/${seeded.id}/curves.csv?versus=deltaT`);
  expect(res.status).toBe(200);
  expect(res.headers['content-disposition']).toMatch(/versus-deltaT\.csv/);
  const lines = res.text.trim().split('\n');
  const head = lines.find((l) => !l.startsWith('#'))!;
  expect(head.split(',')).toEqual(['delta_T_K', 'current_A', 'heat_load_W', 'heat_rejected_W', 'voltage_V', 'power_W', 'cop', 'over_current_limit']);
  const rows = lines.slice(lines.indexOf(head) + 1).map((l) => l.split(','));
  const deltaT = rows.map((r) => Number(r[0]));
  const heat = rows.map((r) => Number(r[2]));
  for (let k = 1; k < rows.length; k += 1) {
    expect(deltaT[k]).toBeGreaterThan(deltaT[k - 1]!);
    // At each ΔT's own max-Qc current, the largest heat load falls as ΔT rises (Ioffe, 1957).
    expect(heat[k]).toBeLessThan(heat[k - 1]!);
  }
  const end = Number(/# maximum ΔT ([\d.e+-]+) K/.exec(res.text)![1]);
  expect(deltaT[deltaT.length - 1]).toBeCloseTo(end, 3);
  expect(Math.abs(heat[heat.length - 1]!)).toBeLessThan(1e-3 * heat[0]!);

  const bad = await api.get(`/api/modules/${seeded.id}/curves.csv?versus=voltage`);
  expect(bad.status).toBe(400);
  expect(bad.body.errors[0]).toEqual({ field: 'versus', message: 'versus must be "current" or "deltaT"' });
});

it('deletes a module for a physicist, not for a viewer, leaving its sources untouched', async () => {
  const api = await signedIn(ctx, demo.physicist);
  const families = (await api.get('/api/families')).body.families as Array<{ id: string; name: string }>;
  const p = families.find((f) => f.name.startsWith('NL-P7 (Bi,Sb)'))!;
  const n = families.find((f) => f.name.startsWith('NL-N3'))!;
  const leg = (familyId: string) => ({ kind: 'family', familyId, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 });
  const saved = await api.post('/api/modules').send({ name: `Short-lived ${Date.now()}`, p: leg(p.id), n: leg(n.id), hotSide: 300, deltaT: 20 });
  expect(saved.status).toBe(201);
  const id = saved.body.module.id as string;
  expect((await (await signedIn(ctx, demo.viewer)).delete(`/api/modules/${id}`)).status).toBe(403);
  expect((await api.delete(`/api/modules/${id}`)).status).toBe(204);
  expect((await api.get(`/api/modules/${id}`)).status).toBe(404);
  expect((await api.delete(`/api/modules/${id}`)).status).toBe(404);
  expect((await api.get(`/api/families/${p.id}`)).status).toBe(200);
});
