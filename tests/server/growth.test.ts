import { growthOrderDetailSchema, growthSheetSchema, measurementReportSchema } from '../../shared/api';
import { familyFromMaterial, propertiesAt, type MaterialInput } from '../../shared/engine';
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import type { MeasurementReport } from '../../shared/growth/measurement-report';
import { databaseNow, demo, eventually, mailTo, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
jest.setTimeout(120_000);
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

type Api = Awaited<ReturnType<typeof signedIn>>;

/** A converged run of the demo p-type family, worked by the test stack's worker. */
async function convergedRun(api: Api): Promise<{ runId: string; uniformDeltaT: number; material: MaterialInput }> {
  const families = (await api.get('/api/families')).body.families as Array<{ id: string; name: string }>;
  const family = families.find((f) => f.name.startsWith('NL-P7 (Bi,Sb)'))!;
  const design = await api.post('/api/designs').send({ name: `Growth ${Date.now()}`, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 6, starts: 1, minZoneMm: 0.2 });
  const runId = (await api.post(`/api/designs/${design.body.design.id}/runs`)).body.run.id as string;
  const done = await eventually(async () => {
    const d = (await api.get(`/api/runs/${runId}`)).body;
    return d.run.state === 'succeeded' ? d : undefined;
  }, 60);
  return { runId, uniformDeltaT: done.result.baselines.uniform.deltaT, material: done.case.material };
}

it('release → sheet (K = 1 is the best uniform leg) → grower steps → measurements flagged → physicist closes', async () => {
  const physicist = await signedIn(ctx, demo.physicist);
  const grower = await signedIn(ctx, demo.grower);
  const { runId, uniformDeltaT, material } = await convergedRun(physicist);
  const batch = `B-${Date.now()}`;
  const released = await physicist.post(`/api/runs/${runId}/release`).send({ batch, dueDate: '2027-02-15', zones: 3, notes: 'for the detector stage' });
  expect(released.status).toBe(201);
  const orderId = released.body.order.id as string;

  // Growers are told by e-mail.
  const mail = await eventually(async () => (await ctx.ds.query('SELECT text FROM captured_mail WHERE $1 = ANY(mail_to) AND subject LIKE $2', [demo.grower, `%${batch}%`]))[0] as { text: string } | undefined);
  expect(mail.text).toContain(`/growth/${orderId}`);

  const ready = await eventually(async () => {
    const d = growthOrderDetailSchema.parse((await grower.get(`/api/growth-orders/${orderId}`)).body);
    return d.order.sheetStatus === 'ready' ? d : undefined;
  }, 90);
  // The stored sheet is what the client's reader accepts (one schema for both sides).
  expect(growthSheetSchema.safeParse(ready.sheet).success).toBe(true);
  const sheet = ready.sheet as unknown as GrowthSheet;
  expect(Math.abs(sheet.steps[0]!.deltaT - uniformDeltaT)).toBeLessThan(0.01);
  for (let k = 1; k < sheet.steps.length; k += 1) expect(sheet.steps[k]!.deltaT).toBeGreaterThanOrEqual(sheet.steps[k - 1]!.deltaT - 1e-9);
  // minZoneMm 0.2 on a 1.5 mm leg: at most 7 zones, none shorter than 0.2 mm.
  expect(sheet.steps.length).toBeLessThanOrEqual(7);
  for (const s of sheet.steps) for (const r of s.rows) expect(r.endMm - r.startMm).toBeGreaterThanOrEqual(0.2 - 1e-9);

  // The grower moves the order one step at a time.
  expect((await grower.put(`/api/growth-orders/${orderId}/state`).send({ state: 'growing' })).status).toBe(400);
  for (const state of ['accepted', 'growing', 'grown']) expect((await grower.put(`/api/growth-orders/${orderId}/state`).send({ state })).status).toBe(200);
  expect((await physicist.put(`/api/growth-orders/${orderId}/state`).send({ state: 'measured' })).status).toBe(403);

  // Measurements: room-temperature S and σ of the 3-zone target, with zone 2 grown 3× too high.
  const step = sheet.steps.find((s) => s.zones === 3)!;
  const family = familyFromMaterial(material);
  const lines = ['position_mm,seebeck_uV_per_K,sigma_S_per_cm'];
  for (let mm = 0.05; mm < 1.5; mm += 0.1) {
    const k = step.rows.findIndex((r) => mm >= r.startMm && mm < r.endMm);
    const at = propertiesAt(family, step.rows[k]!.perCm3 * (k === 1 ? 3 : 1), 300);
    lines.push(`${mm.toFixed(2)},${(at.seebeck * 1e6).toFixed(2)},${(at.sigma / 100).toFixed(3)}`);
  }
  // Measured needs an upload: refused, naming what is missing, before any is in.
  const early = await grower.put(`/api/growth-orders/${orderId}/state`).send({ state: 'measured' });
  expect([early.status, early.body.errors?.[0]?.field, early.body.message]).toEqual([409, 'measurements', expect.stringMatching(/upload the as-grown measurements first/)]);
  const bad = await grower.post(`/api/growth-orders/${orderId}/measurements`).attach('file', Buffer.from('position_mm,seebeck_uV_per_K\n0.5,abc'), 'm.csv');
  expect(bad.status).toBe(400);
  expect(bad.body.errors[0].field).toBe('file:line 2:seebeck_uV_per_K');
  const up = await grower.post(`/api/growth-orders/${orderId}/measurements`).attach('file', Buffer.from(lines.join('\n')), 'as-grown.csv');
  expect(up.status).toBe(201);
  expect(measurementReportSchema.safeParse(up.body.report).success).toBe(true);
  const report = up.body.report as MeasurementReport;
  expect(report.verdicts.map((v) => v.verdict)).toEqual(['within', 'high', 'within']);
  expect(report.asGrown.atDesignCurrent.deltaT).toBeLessThan(report.target.deltaT);
  // The report as CSV: every position with its readings, bands and verdict; the off zone's positions read outside.
  const reportCsv = await physicist.get(`/api/growth-orders/${orderId}/report.csv`);
  expect(reportCsv.status).toBe(200);
  const csvRows = reportCsv.text.split('\n').filter((l) => /^\d/.test(l)).map((l) => l.split(','));
  const csvHeader = reportCsv.text.split('\n').find((l) => l.startsWith('line,'))!.split(',');
  expect(csvHeader).toEqual(expect.arrayContaining(['seebeck_verdict', 'sigma_verdict', 'verdict']));
  expect(csvRows).toHaveLength(report.points.length);
  const col = (name: string) => csvHeader.indexOf(name);
  for (const r of csvRows) {
    const zone = Number(r[col('zone')]);
    expect([r[col('seebeck_verdict')], r[col('verdict')]]).toEqual(zone === 2 ? ['below band', 'outside band (2 of 2 readings)'] : ['within band', 'within band']);
  }
  expect(reportCsv.text).toMatch(/^# zone verdicts,zone 1 within band \(0 of \d+ readings outside\); zone 2 above band \(\d+ of \d+ readings outside\); zone 3 within band/m);
  const physicistMail = await eventually(async () => (await ctx.ds.query('SELECT subject, text FROM captured_mail WHERE $1 = ANY(mail_to) AND subject LIKE $2', [demo.physicist, `%Measurements back for batch ${batch}%`]))[0] as { subject: string; text: string } | undefined);
  expect(physicistMail.text).toMatch(/zone 2 \(high\)/);

  expect((await grower.put(`/api/growth-orders/${orderId}/state`).send({ state: 'measured' })).status).toBe(200);
  expect((await physicist.post(`/api/growth-orders/${orderId}/close`).send({ verdict: 'rejected', reason: '' })).status).toBe(400);
  const beforeClose = await databaseNow(ctx);
  const closed = growthOrderDetailSchema.parse((await physicist.post(`/api/growth-orders/${orderId}/close`).send({ verdict: 'rejected', reason: 'zone 2 overdoped; regrow' })).body);
  expect(closed.order.state).toBe('rejected');
  // The grower is told by a worker, with the reason and a link.
  const verdictMail = await mailTo(ctx, demo.grower, new RegExp(`^Growth order ${batch} rejected$`), { after: beforeClose });
  expect(verdictMail.text).toMatch(/Piet Okafor rejected growth order .*\n\nReason: zone 2 overdoped; regrow\n/);
  expect(verdictMail.text).toContain(`/growth/${orderId}`);
  // Nobody else in the team is mailed the verdict (the physicist who closed it, the viewer).
  const others: Array<{ n: number }> = await ctx.ds.query('SELECT count(*)::int AS n FROM captured_mail WHERE subject = $1 AND NOT ($2 = ANY(mail_to))', [`Growth order ${batch} rejected`, demo.grower]);
  expect(others[0]!.n).toBe(0);
  expect(closed.timeline.map((e) => e.toState ?? e.kind)).toEqual(['requested', 'accepted', 'growing', 'grown', 'measured', 'measured', 'rejected']);
  expect(closed.timeline.map((e) => e.by)).toContain('Greta Moreau');
  // A closed order is a record: no step, upload, sheet change or second verdict; each 409 names `state`.
  const refusals = [
    await grower.put(`/api/growth-orders/${orderId}/state`).send({ state: 'measured' }),
    await grower.post(`/api/growth-orders/${orderId}/measurements`).attach('file', Buffer.from(lines.join('\n')), 'again.csv'),
    await physicist.put(`/api/growth-orders/${orderId}/sheet`).send({ zones: 2 }),
    await physicist.put(`/api/growth-orders/${orderId}/sheet`).send({ lossBudget: 2 }),
    await physicist.post(`/api/growth-orders/${orderId}/close`).send({ verdict: 'rejected', reason: 'twice' }),
  ];
  for (const r of refusals) expect([r.status, r.body.errors?.[0]?.field, r.body.message]).toEqual([409, 'state', expect.stringMatching(/closed \(rejected\)/)]);
  const after = growthOrderDetailSchema.parse((await physicist.get(`/api/growth-orders/${orderId}`)).body);
  expect([after.order.zones, after.order.lossBudget, after.measurements.length, after.timeline.length]).toEqual([closed.order.zones, closed.order.lossBudget, closed.measurements.length, closed.timeline.length]);

  const csv = await grower.get(`/api/growth-orders/${orderId}/sheet.csv`);
  expect(csv.text).toMatch(/Model predictions: verify/);
  expect(csv.text.trim().split('\n').filter((l) => /^\d,/.test(l))).toHaveLength(3);
  expect((await (await signedIn(ctx, demo.otherTeamAdmin)).get(`/api/growth-orders/${orderId}`)).status).toBe(404);
});

it('only a converged run can be released', async () => {
  const physicist = await signedIn(ctx, demo.physicist);
  const families = (await physicist.get('/api/families')).body.families as Array<{ id: string; isDemo: boolean; kind: string }>;
  // A demo band model: other test files add families (a constant-property one among them) that may sort first.
  const family = families.find((f) => f.isDemo && f.kind === 'band')!;
  const design = await physicist.post('/api/designs').send({ name: `Queued ${Date.now()}`, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 6, starts: 300 });
  const runId = (await physicist.post(`/api/designs/${design.body.design.id}/runs`)).body.run.id as string;
  const res = await physicist.post(`/api/runs/${runId}/release`).send({ batch: 'too early' });
  expect(res.status).toBe(409);
  await physicist.post(`/api/runs/${runId}/cancel`);
});

it('the sheet\'s bands hold jointly and carry a yield; the grower changes the scatter and a worker recomputes it; Hall uploads state their factor', async () => {
  const physicist = await signedIn(ctx, demo.physicist);
  const grower = await signedIn(ctx, demo.grower);
  const { runId, material } = await convergedRun(physicist);
  const released = await physicist.post(`/api/runs/${runId}/release`).send({ batch: `Y-${Date.now()}`, zones: 3 });
  expect(released.status).toBe(201);
  const orderId = released.body.order.id as string;
  expect(released.body.order.dopingScatter).toBe(0.05);
  const ready = await eventually(async () => {
    const d = growthOrderDetailSchema.parse((await grower.get(`/api/growth-orders/${orderId}`)).body);
    return d.order.sheetStatus === 'ready' ? d : undefined;
  }, 90);
  expect([ready.order.yieldStatus, ready.order.sheetProgress]).toEqual(['ready', null]);
  const sheet = ready.sheet as unknown as GrowthSheet;
  expect(sheet.dopingScatter).toBe(0.05);
  for (const s of sheet.steps) {
    // Every corner re-solved (K ≤ 6 here: zones ≥ 0.2 mm on 1.5 mm) and within the budget.
    expect(s.joint).toMatchObject({ method: 'all-corners', cornersSolved: 2 ** s.zones });
    expect(s.joint.worstCornerLoss).toBeLessThanOrEqual(sheet.lossBudget + 1e-6);
    expect(s.yield.scatterDecades).toBe(0.05);
    expect(s.yield.samples).toBeGreaterThanOrEqual(400);
    expect(s.yield.histogram.counts.reduce((a, n) => a + n, 0) + s.yield.histogram.below).toBe(s.yield.samples - s.yield.infeasible);
  }
  const three = sheet.steps.find((s) => s.zones === 3)!;
  // The one-zone-at-a-time bands of this sheet broke the budget at their corners; the sheet's do not.
  expect(three.joint.perZoneWorstCornerLoss).toBeGreaterThan(2 * sheet.lossBudget);
  expect(three.joint.scale).toBeLessThan(1);
  const csv = (await grower.get(`/api/growth-orders/${orderId}/sheet.csv`)).text;
  expect(csv).toMatch(/^# tolerance bands,"computed jointly: every combination inside the bands keeps the loss ≤ 1 K \(corners re-solved: 8, all of them/m);
  expect(csv).toMatch(/^# yield,"?\d+(\.\d)? % of 600 simulated as-grown legs lose ≤ 1 K at a doping scatter of 0\.05 decades/m);

  // The scatter: validated, refused for a viewer, and recomputed by a worker when the grower changes it.
  const badScatter = await grower.put(`/api/growth-orders/${orderId}/yield`).send({ dopingScatter: 3 });
  expect([badScatter.status, badScatter.body.errors?.[0]?.field]).toEqual([400, 'dopingScatter']);
  expect((await (await signedIn(ctx, demo.viewer)).put(`/api/growth-orders/${orderId}/yield`).send({ dopingScatter: 0.1 })).status).toBe(403);
  const changed = growthOrderDetailSchema.parse((await grower.put(`/api/growth-orders/${orderId}/yield`).send({ dopingScatter: 0.15 })).body);
  expect([changed.order.dopingScatter, changed.order.yieldStatus]).toEqual([0.15, 'computing']);
  const recomputed = await eventually(async () => {
    const d = growthOrderDetailSchema.parse((await grower.get(`/api/growth-orders/${orderId}`)).body);
    return d.order.yieldStatus === 'ready' ? d : undefined;
  }, 90);
  const after = recomputed.sheet as unknown as GrowthSheet;
  const threeAfter = after.steps.find((s) => s.zones === 3)!;
  expect(after.dopingScatter).toBe(0.15);
  expect(threeAfter.yield.scatterDecades).toBe(0.15);
  // Three times the scatter: fewer legs meet the budget; zones and bands are untouched.
  expect(threeAfter.yield.meetsBudget).toBeLessThan(three.yield.meetsBudget);
  expect(threeAfter.rows).toEqual(three.rows);
  expect(recomputed.order.sheetProgress).toBeNull();

  // Hall concentrations of the 3-zone targets: the report states the band model's factor; a hand-entered one overrides it.
  for (const state of ['accepted', 'growing', 'grown']) expect((await grower.put(`/api/growth-orders/${orderId}/state`).send({ state })).status).toBe(200);
  const lines = ['position_mm,n_per_cm3'];
  for (let mm = 0.05; mm < 1.5; mm += 0.1) lines.push(`${mm.toFixed(2)},${three.rows.find((r) => mm >= r.startMm && mm < r.endMm)!.perCm3.toPrecision(6)}`);
  const file = Buffer.from(lines.join('\n'));
  const fromModel = await grower.post(`/api/growth-orders/${orderId}/measurements`).attach('file', file, 'hall.csv');
  expect(fromModel.status).toBe(201);
  const modelReport = fromModel.body.report as MeasurementReport;
  expect(modelReport.hall).toMatchObject({ source: 'band-model' });
  expect(modelReport.hall!.note).toMatch(/^Hall factor from the band model .* r_H = 1\.\d{3}/);
  const hallPoint = modelReport.points[0]!;
  expect(hallPoint.perCm3 / hallPoint.hallPerCm3!).toBeCloseTo(hallPoint.hallFactor!, 9);
  expect(hallPoint.hallFactor!).toBeGreaterThan(1);
  const entered = await grower.post(`/api/growth-orders/${orderId}/measurements`).field('hallFactor', '1').attach('file', file, 'hall.csv');
  expect(entered.status).toBe(201);
  expect((entered.body.report as MeasurementReport).hall).toMatchObject({ source: 'entered', min: 1, max: 1 });
  for (const bad of ['abc', '5']) {
    const res = await grower.post(`/api/growth-orders/${orderId}/measurements`).field('hallFactor', bad).attach('file', file, 'hall.csv');
    expect([res.status, res.body.errors?.[0]?.field]).toEqual([400, 'hallFactor']);
  }
  const stored = growthOrderDetailSchema.parse((await physicist.get(`/api/growth-orders/${orderId}`)).body);
  expect(stored.measurements).toHaveLength(2);
  // Hall readings are judged against the zone's doping band too: on target, every one inside it.
  expect(modelReport.points.every((q) => q.readings.length === 1 && q.readings[0]!.kind === 'hall' && q.readings[0]!.verdict === 'within')).toBe(true);
  // Approved with a reason: the grower hears that too.
  expect((await grower.put(`/api/growth-orders/${orderId}/state`).send({ state: 'measured' })).status).toBe(200);
  const beforeApproval = await databaseNow(ctx);
  expect((await physicist.post(`/api/growth-orders/${orderId}/close`).send({ verdict: 'approved', reason: 'every zone within band' })).status).toBe(200);
  const approvedMail = await mailTo(ctx, demo.grower, /^Growth order Y-\d+ approved$/, { after: beforeApproval });
  expect(approvedMail.text).toMatch(/Reason: every zone within band/);
  expect(stored.measurements.map((m) => measurementReportSchema.parse(m.report).hall?.source).sort()).toEqual(['band-model', 'entered']);
  expect(material.kind).toBe('band');
});
