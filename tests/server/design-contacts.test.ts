/**
 * A design with contacts at each end and a parasitic load, through the real
 * stack: saved, run by the test stack's worker, released to growth, and its
 * sheet, curves and module all computed with them.
 */
import { growthOrderDetailSchema, growthSheetSchema } from '../../shared/api';
import { legsFromRun, parseCase, parseCurvesCase, runCurves, solveLeg, type CaseInput, type RunResultLegs } from '../../shared/engine';
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import { demo, eventually, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
jest.setTimeout(180_000);
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

type Api = Awaited<ReturnType<typeof signedIn>>;

async function familyId(api: Api, prefix: string): Promise<string> {
  const families = (await api.get('/api/families')).body.families as Array<{ id: string; name: string }>;
  return families.find((f) => f.name.startsWith(prefix))!.id;
}

const designBody = (familyId: string, extra: Record<string, unknown>) => ({
  name: `Contacts ${Date.now()} ${Math.random()}`, familyId, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 6, starts: 1, minZoneMm: 0.2, ...extra,
});

it('bad contact or parasitic fields are refused naming the field; nothing is saved', async () => {
  const api = await signedIn(ctx, demo.physicist);
  const p = await familyId(api, 'NL-P7 (Bi,Sb)');
  const before = (await ctx.ds.query('SELECT count(*)::int AS n FROM design'))[0].n as number;
  for (const [extra, field] of [
    [{ coldContactMicroOhmCm2: -1 }, 'coldContactMicroOhmCm2'],
    [{ hotContactMicroOhmCm2: 1e5 }, 'hotContactMicroOhmCm2'],
    [{ parasitic: 'radiation', emissivity: 0.3 }, 'surroundingsK'],
    [{ parasitic: 'fixed' }, 'parasiticLoadW'],
    [{ parasitic: 'gas' }, 'parasitic'],
  ] as const) {
    const res = await api.post('/api/designs').send(designBody(p, extra));
    expect([res.status, res.body.errors?.[0]?.field]).toEqual([400, field]);
  }
  expect((await ctx.ds.query('SELECT count(*)::int AS n FROM design'))[0].n).toBe(before);
});

it('a design saved before contacts existed reads as ideal and runs as before', async () => {
  const api = await signedIn(ctx, demo.physicist);
  const p = await familyId(api, 'NL-P7 (Bi,Sb)');
  const saved = (await api.post('/api/designs').send(designBody(p, {}))).body.design as { id: string };
  // As the migration leaves an older row: the defaults, nothing else.
  const [row] = await ctx.ds.query('SELECT cold_contact_micro_ohm_cm2, hot_contact_micro_ohm_cm2, parasitic, parasitic_load_w, emissivity, surroundings_k FROM design WHERE id = $1', [saved.id]);
  expect(row).toEqual({ cold_contact_micro_ohm_cm2: 0, hot_contact_micro_ohm_cm2: 0, parasitic: 'none', parasitic_load_w: 0, emissivity: 0, surroundings_k: null });
  const runId = (await api.post(`/api/designs/${saved.id}/runs`)).body.run.id as string;
  const detail = await eventually(async () => {
    const d = (await api.get(`/api/runs/${runId}`)).body;
    return d.run.state === 'succeeded' ? d : undefined;
  }, 60);
  expect(detail.case.contactResistivity).toBeUndefined();
  expect(detail.case.parasitic).toBeUndefined();
});

it('contacts and a parasitic load: saved, run, released; the sheet, curves and module use them', async () => {
  const physicist = await signedIn(ctx, demo.physicist);
  const grower = await signedIn(ctx, demo.grower);
  const p = await familyId(physicist, 'NL-P7 (Bi,Sb)');
  const n = await familyId(physicist, 'NL-N3 Bi');
  const created = await physicist.post('/api/designs').send(designBody(p, { coldContactMicroOhmCm2: 5, hotContactMicroOhmCm2: 5, parasitic: 'fixed', parasiticLoadW: 0.002 }));
  expect(created.status).toBe(201);
  expect(created.body.design).toMatchObject({ coldContactMicroOhmCm2: 5, hotContactMicroOhmCm2: 5, parasitic: 'fixed', parasiticLoadW: 0.002, surroundingsK: null });
  const designId = created.body.design.id as string;

  const runId = (await physicist.post(`/api/designs/${designId}/runs`)).body.run.id as string;
  const detail = await eventually(async () => {
    const d = (await physicist.get(`/api/runs/${runId}`)).body;
    return d.run.state === 'succeeded' ? d : undefined;
  }, 60);
  // The case as run: 5 µΩ·cm² = 5e-10 Ω·m² at each junction, 2 mW onto the cold end.
  expect(detail.case.contactResistivity).toEqual({ cold: 5e-10, hot: 5e-10 });
  expect(detail.case.parasitic).toEqual({ heatLoad: 0.002 });
  expect(detail.design).toMatchObject({ coldContactMicroOhmCm2: 5, parasitic: 'fixed' });

  // The stored optimum is the contacted leg's: solveLeg with the same ends agrees; without them it cools ~3 K more.
  const { bounds: _b, controlPoints: _c, objective: _o, heatLoad: _h, ...leg } = detail.case as CaseInput;
  const at = (c: object) => solveLeg(parseCase({ ...c, doping: detail.result.doping, current: detail.result.current, heatLoad: 0 }, 'solve')).deltaT;
  expect(Math.abs(at(leg) - detail.result.deltaT)).toBeLessThan(1e-6);
  const { contactResistivity: _r, parasitic: _p, ...bare } = leg;
  expect(at(bare) - detail.result.deltaT).toBeGreaterThan(2);

  // Released: the sheet says what it was computed with, and K = 1 is the contacted best uniform leg.
  const released = await physicist.post(`/api/runs/${runId}/release`).send({ batch: `C-${Date.now()}`, zones: 2 });
  expect(released.status).toBe(201);
  const ready = await eventually(async () => {
    const d = growthOrderDetailSchema.parse((await grower.get(`/api/growth-orders/${released.body.order.id}`)).body);
    return d.order.sheetStatus === 'ready' ? d : undefined;
  }, 90);
  expect(growthSheetSchema.safeParse(ready.sheet).success).toBe(true);
  const sheet = ready.sheet as unknown as GrowthSheet;
  expect(sheet.ends).toEqual({ contacts: { cold: 5e-10, hot: 5e-10 }, parasitic: { heatLoad: 0.002 } });
  expect(Math.abs(sheet.steps[0]!.deltaT - detail.result.baselines.uniform.deltaT)).toBeLessThan(0.01);
  const sheetCsv = (await grower.get(`/api/growth-orders/${released.body.order.id}/sheet.csv`)).text;
  expect(sheetCsv).toMatch(/computed with contacts 5 µΩ·cm² \(cold\) and 5 µΩ·cm² \(hot\).*parasitic load 0\.002 W per leg/);

  // The operating-curves page builds its legs from the stored case: they carry the ends, and cost heat load.
  const legs = legsFromRun(detail.case, detail.result as RunResultLegs);
  expect(legs.optimum).toMatchObject({ contactResistivity: { cold: 5e-10, hot: 5e-10 }, parasitic: { heatLoad: 0.002 } });
  const curve = runCurves(parseCurvesCase({ ...legs.optimum, hotSide: 300, deltaT: 30 }));
  const { contactResistivity: _lc, parasitic: _lp, ...bareLeg } = legs.optimum;
  const ideal = runCurves(parseCurvesCase({ ...bareLeg, hotSide: 300, deltaT: 30 }));
  expect(ideal.maxHeatLoad.heatLoad - curve.maxHeatLoad.heatLoad).toBeGreaterThan(0.002);

  // A module of this run's leg keeps them; a module's own contact value replaces the legs'.
  const moduleInput = { name: `Contacts module ${Date.now()}`, p: { kind: 'run', runId }, n: { kind: 'family', familyId: n, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 }, hotSide: 300, deltaT: 30, couples: 4 };
  const made = await physicist.post('/api/modules').send(moduleInput);
  expect(made.status).toBe(201);
  expect(made.body.module.case.p).toMatchObject({ contactResistivity: { cold: 5e-10, hot: 5e-10 }, parasitic: { heatLoad: 0.002 } });
  const own = await physicist.post('/api/modules').send({ ...moduleInput, name: `${moduleInput.name} own`, contactResistivity: 1e-10 });
  expect(own.status).toBe(201);
  expect(own.body.module.case.p.contactResistivity).toBeUndefined();
  expect(own.body.module.case.contactResistivity).toBe(1e-10);
  const csv = (id: string) => physicist.get(`/api/modules/${id}/curves.csv`);
  const maxQc = (text: string) => Math.max(...text.trim().split('\n').filter((l) => /^[\d.]/.test(l)).map((l) => Number(l.split(',')[1])));
  expect(maxQc((await csv(own.body.module.id)).text)).toBeGreaterThan(maxQc((await csv(made.body.module.id)).text));
});
