import { growthOrderDetailSchema } from '../../shared/api';
import { parseTableCsv } from '../../shared/families/parse-table-csv';
import { demo, eventually, openContext, signedIn, type TestContext } from './context';
import { expectCellOf, hostileTexts, oneLine, readSafeCsv } from './csv-safety';

/**
 * Every CSV export, fed names, sources and batches written to attack a
 * spreadsheet (issue 13): read back with csv-parse, each text comes back
 * whole in its own cell (behind an apostrophe when it starts like a
 * formula), no line is split by it, and numbers stay numbers.
 */
let ctx: TestContext;
jest.setTimeout(180_000);
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

type Api = Awaited<ReturnType<typeof signedIn>>;
const stamp = Date.now();
/** Names are unique per team: the stamp goes last, so each text still starts as it was written. */
const named = (text: string): string => `${text} ${stamp}`;

async function demoFamilies(api: Api): Promise<{ p: string; n: string }> {
  const families = (await api.get('/api/families')).body.families as Array<{ id: string; name: string; carrier: string; kind: string }>;
  return { p: families.find((f) => f.name.startsWith('NL-P7 (Bi,Sb)'))!.id, n: families.find((f) => f.carrier === 'n' && f.kind === 'band')!.id };
}

describe('GET /api/families/:id/export.csv', () => {
  it('carries hostile names and sources as whole, neutralised cells of one-line comments, and uploads back', async () => {
    const api = await signedIn(ctx, demo.physicist);
    // An n-type constant family: its Seebeck column is negative numbers, which must stay numbers.
    const definition = { kind: 'constant', seebeck: -1.5e-4, sigma: 9e4, kappa: 1.4 };
    for (const text of hostileTexts) {
      const created = await api.post('/api/families').send({ name: named(text), source: text, definition });
      expect(created.status).toBe(201);
      const res = await api.get(`/api/families/${created.body.family.id}/export.csv`);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
      const csv = readSafeCsv(res.text);
      expectCellOf(csv.comments[0]!, oneLine(named(text)));
      expect(csv.comments[1]![0]).toBe('# source');
      expectCellOf(csv.comments[1]!, oneLine(text));
      expect(csv.header).toEqual(['n_per_cm3', 'temperature_K', 'seebeck_uV_per_K', 'sigma_S_per_cm', 'kappa_W_per_m_K']);
      expect(csv.rows.every((r) => Number(r[2]) === -150)).toBe(true);
      // Our own upload parser skips the comments whole and reads the same table.
      const again = parseTableCsv(res.text);
      expect(again.errors).toEqual([]);
      expect(again.rows).toHaveLength(csv.rows.length);
    }
  });

  it('a family duplicated as x,=1+1,@SUM(1) exports that name in one cell, never a formula cell =1+1', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const { p } = await demoFamilies(api);
    const name = `x,=1+1,@SUM(1) copy ${stamp}`;
    const copy = await api.post(`/api/families/${p}/duplicate`).send({ name });
    expect(copy.status).toBe(201);
    const res = await api.get(`/api/families/${copy.body.family.id}/export.csv`);
    const csv = readSafeCsv(res.text);
    expect(csv.comments[0]).toEqual(['# family', name, 'version 1 (band model sampled on a grid)']);
    expect(csv.rows).toHaveLength(13 * 9);
  });
});

describe('GET /api/modules/:id/curves.csv', () => {
  it('carries hostile module names as whole, neutralised cells, versus current and versus ΔT', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const { p, n } = await demoFamilies(api);
    const leg = (familyId: string) => ({ kind: 'family', familyId, perCm3: 2e19, lengthMm: 1.5, areaMm2: 1 });
    for (const text of hostileTexts) {
      const saved = await api.post('/api/modules').send({ name: named(text), p: leg(p), n: leg(n), hotSide: 300, deltaT: 30, couples: 7, currentLimit: 3 });
      expect(saved.status).toBe(201);
      for (const query of ['', '?versus=deltaT']) {
        const res = await api.get(`/api/modules/${saved.body.module.id}/curves.csv${query}`);
        expect(res.status).toBe(200);
        const csv = readSafeCsv(res.text, ['yes', 'no']);
        expect(csv.comments[0]![0]).toBe('# Frostgrade module');
        expectCellOf(csv.comments[0]!, oneLine(named(text)));
        expect(csv.rows.length).toBeGreaterThan(5);
        if (query === '') expect(csv.rows.some((r) => r.at(-1) === 'yes')).toBe(true); // currents above 3 A flagged
      }
    }
  });
});

describe('a run, its export and its growth sheets', () => {
  let runId = '';
  beforeAll(async () => {
    const api = await signedIn(ctx, demo.physicist);
    const { p } = await demoFamilies(api);
    const design = await api.post('/api/designs').send({ name: named('=HYPERLINK("http://example.com")'), familyId: p, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 5, starts: 1, minZoneMm: 0.3 });
    expect(design.status).toBe(201);
    runId = (await api.post(`/api/designs/${design.body.design.id}/runs`)).body.run.id as string;
    await eventually(async () => ((await api.get(`/api/runs/${runId}`)).body.run.state === 'succeeded' ? true : undefined), 90);
  });

  it('GET /api/runs/:id/export.csv: comments start with #, every data cell is a number', async () => {
    const api = await signedIn(ctx, demo.viewer);
    const res = await api.get(`/api/runs/${runId}/export.csv`);
    expect(res.status).toBe(200);
    const csv = readSafeCsv(res.text);
    expect(csv.comments[0]![0]).toBe(`# Frostgrade run ${runId} (succeeded)`);
    expect(csv.comments[1]!.map((c) => c.replace(/-?\d[\d.]*(e[+-]?\d+)?/g, 'N'))).toEqual(['# cold side N K', 'hot side N K', 'deltaT N K', 'current N A', 'heat load N W', 'COP N']);
    expect(csv.header).toEqual(['x_mm', 'temperature_K', 'n_per_cm3', 'seebeck_uV_per_K', 'sigma_S_per_cm', 'kappa_W_per_m_K', 'zT']);
    expect(Number(csv.rows.at(-1)![0])).toBeCloseTo(1.5, 6);
  });

  it('GET /api/growth-orders/:id/sheet.csv carries hostile batches as whole, neutralised cells', async () => {
    const physicist = await signedIn(ctx, demo.physicist);
    const grower = await signedIn(ctx, demo.grower);
    // The sheet of every release is worked by the stack's worker; they are queued together.
    const orders: Array<{ batch: string; id: string }> = [];
    for (const text of hostileTexts) {
      const released = await physicist.post(`/api/runs/${runId}/release`).send({ batch: named(text), zones: 2 });
      expect(released.status).toBe(201);
      orders.push({ batch: named(text), id: released.body.order.id as string });
    }
    for (const { batch, id } of orders) {
      await eventually(async () => (growthOrderDetailSchema.parse((await grower.get(`/api/growth-orders/${id}`)).body).order.sheetStatus === 'ready' ? true : undefined), 120);
      const res = await grower.get(`/api/growth-orders/${id}/sheet.csv`);
      expect(res.status).toBe(200);
      const csv = readSafeCsv(res.text);
      expect(csv.comments[0]![0]).toBe('# Frostgrade growth sheet for batch');
      expectCellOf(csv.comments[0]!, oneLine(batch));
      expect(csv.rows.map((r) => r[0])).toEqual(['1', '2']);
      // The measurement report of the same order carries the batch the same way, and each position's verdict in words.
      const up = await grower.post(`/api/growth-orders/${id}/measurements`).attach('file', Buffer.from('position_mm,seebeck_uV_per_K\n0.4,200\n1.2,180\n'), 'as-grown.csv');
      expect(up.status).toBe(201);
      const report = readSafeCsv((await grower.get(`/api/growth-orders/${id}/report.csv`)).text, ['within band', 'above band', 'below band', 'outside band (1 of 1 readings)']);
      expect(report.comments[0]![0]).toBe('# Frostgrade as-grown measurement report for batch');
      expectCellOf(report.comments[0]!, oneLine(batch));
      expect(report.rows.map((r) => r.at(-1))).toEqual(report.rows.map(() => expect.stringMatching(/^(within band|outside band \(1 of 1 readings\))$/)));
    }
  });
});
