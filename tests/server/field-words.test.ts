import { demo, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
jest.setTimeout(60_000);
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

const unknownRun = '00000000-0000-4000-8000-00000000abcd';
/** A schema key written as code: camelCase words like "dueDate" or "coldSide". */
const schemaKey = /\b[a-z]+[A-Z][A-Za-z0-9]*\b/;

describe('refused input names each field as its form labels it', () => {
  it('words a release’s due date and zones by their labels, in the field list and the message', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const res = await api.post(`/api/runs/${unknownRun}/release`).send({ batch: 'NL-P7-24-031', dueDate: '31/01/2027', zones: 20 });
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual([
      { field: 'dueDate', message: 'Due date must be a date like 2027-01-31' },
      { field: 'zones', message: 'Zones K must be 1–12' },
    ]);
    expect(res.body.message).toBe('Due date must be a date like 2027-01-31; Zones K must be 1–12');
  });

  it('words a design’s cross-field rule and zod’s own limits without schema keys', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const families = (await api.get('/api/families')).body.families as Array<{ id: string }>;
    const res = await api.post('/api/designs').send({ name: 'Words', familyId: families[0].id, objective: 'maxHeatLoad', lengthMm: 1.5, areaMm2: 1, hotSide: 300, coldSide: 310, heatLoad: 0.01, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 5, starts: 0 });
    expect(res.status).toBe(400);
    const messages = (res.body.errors as Array<{ message: string }>).map((e) => e.message);
    expect(messages).toContain('Cold-side target Tc must be below Hot-side temperature Th');
    expect(messages.some((m) => m.startsWith('Search starts '))).toBe(true);
    for (const m of [...messages, res.body.message as string]) expect(m).not.toMatch(schemaKey);
  });

  it('words a module’s legs by side and a service’s refusal by label', async () => {
    const api = await signedIn(ctx, demo.physicist);
    const families = (await api.get('/api/families')).body.families as Array<{ id: string; carrier: string | null }>;
    const n = families.find((f) => f.carrier === 'n')!;
    const leg = { kind: 'family', familyId: n.id, perCm3: 2e25, lengthMm: 1.5, areaMm2: 1 };
    const bad = await api.post('/api/modules').send({ name: 'Words', p: leg, n: leg, hotSide: 50, deltaT: 30 });
    expect(bad.status).toBe(400);
    expect(bad.body.errors).toEqual(expect.arrayContaining([
      { field: 'p.perCm3', message: 'Doping n (p-type leg) must be at most 1e22 cm⁻³ (a value in m⁻³ is 10⁶ too large)' },
      { field: 'hotSide', message: 'Hot-side temperature Th must be at least 100' },
    ]));
    const noRun = await api.post('/api/modules').send({ name: 'Words', p: { kind: 'run', runId: unknownRun }, n: { ...leg, perCm3: 2e19 }, hotSide: 300, deltaT: 30 });
    expect(noRun.status).toBe(400);
    expect(noRun.body.message).toBe('Run (p-type leg): no such run in this team');
  });
});
