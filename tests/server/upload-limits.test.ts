/**
 * Bounded work per request, against the running test stack's API process
 * (FROSTGRADE_E2E_URL) over real HTTP: hostile tables are refused by their
 * size caps, and the API keeps answering while it reads them.
 */
import { apiErrorBodySchema, healthResponseSchema, uploadPreviewSchema } from '../../shared/api';
import { tableLimits } from '../../shared/engine/table-limits';
import { MaterialFamily } from '../../server/db/entities';
import { uploadGate } from '../../server/http/upload';
import { apiThreadGate } from '../../server/services/api-threads';
import { demo, openContext, signedIn, type TestContext } from './context';
import { fullGridCsv, sparseGridCsv, sparseGridRows } from './fixtures/table-files';

const origin = process.env.FROSTGRADE_E2E_URL;
if (!origin) throw new Error('FROSTGRADE_E2E_URL is not set: run through `npm test -- tests/server/upload-limits`');

let ctx: TestContext;
let cookie: string;
beforeAll(async () => {
  ctx = await openContext();
  const [user] = await ctx.ds.query('SELECT id FROM app_user WHERE email = $1', [demo.physicist]);
  const c = ctx.auth.createSessionCookie((await ctx.auth.createSession((user as { id: string }).id, {})).id);
  cookie = `${c.name}=${c.value}`;
});
afterAll(async () => { await ctx.close(); });

const familyCount = (): Promise<number> => ctx.ds.getRepository(MaterialFamily).count();

function upload(path: string, csv: string, fields: Record<string, string> = {}): Promise<Response> {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  form.append('file', new Blob([csv], { type: 'text/csv' }), 'table.csv');
  return fetch(`${origin}/api${path}`, { method: 'POST', headers: { cookie, origin: origin! }, body: form });
}

/**
 * Runs `work` while asking GET /api/health again and again, one request
 * after the other; says how many were answered before `work` finished.
 */
async function withHealthProbes<T>(work: () => Promise<T>): Promise<{ result: T; statuses: number[]; answeredDuring: number }> {
  let done = false;
  let answeredDuring = 0;
  const statuses: number[] = [];
  const probe = (async () => {
    while (!done) {
      const res = await fetch(`${origin}/api/health`);
      healthResponseSchema.parse(await res.json());
      statuses.push(res.status);
      if (!done) answeredDuring += 1;
    }
  })();
  const result = await work().finally(() => { done = true; });
  await probe;
  return { result, statuses, answeredDuring };
}

async function expectHealthy(): Promise<void> {
  const res = await fetch(`${origin}/api/health`);
  expect(res.status).toBe(200);
  expect(healthResponseSchema.parse(await res.json()).status).toBe('ok');
}

// A sanity bound, not a speed claim: the largest accepted table takes a few seconds on a loaded 2-core machine (figures: npm run bench).
jest.setTimeout(60_000);

describe('hostile measured tables over real HTTP', () => {
  it.each([2000, 6000])('refuses a %d-row file whose dopings and temperatures are all different, naming the cap; health stays answered', async (rows) => {
    const csv = sparseGridCsv(rows);
    const before = await familyCount();
    const { result: res, statuses } = await withHealthProbes(() => upload('/families/upload/preview', csv));
    expect(res.status).toBe(400);
    const body = apiErrorBodySchema.parse(await res.json());
    expect(body.errors).toEqual([{ field: 'file', message: `the file has ${rows} different carrier concentrations; a table holds at most ${tableLimits.dopings} (a measurement campaign has tens)` }]);
    // Every health request asked while the file was read got its answer.
    expect(statuses.length).toBeGreaterThan(0);
    expect(statuses.every((s) => s === 200)).toBe(true);

    const saved = await upload('/families/upload', csv, { name: `Sparse ${rows} ${Date.now()}`, source: 'a hostile file' });
    expect(saved.status).toBe(400);
    expect(apiErrorBodySchema.parse(await saved.json()).errors?.[0]).toMatchObject({ field: 'file', message: expect.stringMatching(/different carrier concentrations; a table holds at most/) });
    expect(await familyCount()).toBe(before);
    await expectHealthy();
  });

  it('refuses more rows than a table holds before parsing them', async () => {
    const res = await upload('/families/upload/preview', fullGridCsv(101, 200));
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(await res.json()).errors).toEqual([{ field: 'file', message: expect.stringMatching(/^the file has 20200 rows; a table holds at most 20000/) }]);
  });

  it('reads the largest table it accepts in a thread: health requests are answered while it works', async () => {
    const { result: res, statuses, answeredDuring } = await withHealthProbes(() => upload('/families/upload/preview', fullGridCsv(100, 200)));
    expect(res.status).toBe(200);
    const preview = uploadPreviewSchema.parse(await res.json());
    expect(preview).toMatchObject({ ok: true, rowCount: 20_000, errors: [] });
    expect(preview.coverage).toMatchObject({ measured: 20_000, holes: 0, present: null });
    expect(answeredDuring).toBeGreaterThan(0);
    expect(statuses.every((s) => s === 200)).toBe(true);
    await expectHealthy();
  });

  it('describes a sparse grid under the caps by counting its holes, naming the first five', async () => {
    const res = await upload('/families/upload/preview', sparseGridCsv(tableLimits.dopings));
    expect(res.status).toBe(200);
    const preview = uploadPreviewSchema.parse(await res.json());
    const cells = tableLimits.dopings ** 2;
    expect(preview.ok).toBe(false);
    expect(preview.coverage).toMatchObject({ measured: tableLimits.dopings, holes: cells - tableLimits.dopings, present: null });
    expect(preview.coverage.firstHoles).toHaveLength(5);
    expect(preview.errors).toEqual([expect.objectContaining({ message: expect.stringMatching(new RegExp(`^the grid has ${cells - tableLimits.dopings} hole`)) })]);
  });
});

describe('hostile JSON families over real HTTP', () => {
  const post = (rows: unknown[]): Promise<Response> =>
    fetch(`${origin}/api/families`, {
      method: 'POST',
      headers: { cookie, origin: origin!, 'content-type': 'application/json' },
      body: JSON.stringify({ name: `JSON table ${Date.now()}`, source: 'a hostile body', definition: { kind: 'table', rows } }),
    });

  it('refuses a table with more rows than a table holds, naming definition.rows', async () => {
    const rows = Array.from({ length: tableLimits.rows + 1 }, (_, k) => ({ perCm3: 1e18 * (1 + (k % 100)), temperature: 200 + Math.floor(k / 100), seebeck: 2e-4, sigma: 1e5, kappa: 1.5 }));
    const res = await post(rows);
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(await res.json()).errors).toEqual([{ field: 'definition.rows', message: expect.stringMatching(/^20001 rows; a table holds at most 20000/) }]);
  });

  it('refuses 2,000 rows with all dopings different before the engine builds a grid; health stays answered', async () => {
    const before = await familyCount();
    const { result: res, statuses } = await withHealthProbes(() => post(sparseGridRows(2000)));
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(await res.json()).errors).toEqual([{ field: 'definition.rows', message: expect.stringMatching(/^2000 different carrier concentrations; a table holds at most 200/) }]);
    expect(statuses.every((s) => s === 200)).toBe(true);
    expect(await familyCount()).toBe(before);
    await expectHealthy();
  });

  it('checks a JSON table with the engine in a thread and still names the row it refuses', async () => {
    const rows = sparseGridRows(4).map((r, k) => ({ ...r, perCm3: k < 2 ? 1e18 : 1e19, temperature: k % 2 ? 300 : 250, seebeck: k === 3 ? -2e-4 : 2e-4 }));
    const res = await post(rows);
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(await res.json()).errors).toEqual([{ field: 'definition.rows[3].seebeck', message: expect.stringMatching(/same, non-zero sign/) }]);
  });
});

describe('the API’s gates', () => {
  it('answers 503 with Retry-After and a plain message when every thread and queue place is taken', async () => {
    // The in-process app shares this module's gate: fill it, ask, then give every place back.
    const { maxRunning, maxWaiting } = apiThreadGate;
    const held = await Promise.all(Array.from({ length: maxRunning }, () => apiThreadGate.enter()));
    const queued = Array.from({ length: maxWaiting }, () => apiThreadGate.enter());
    try {
      const api = await signedIn(ctx, demo.physicist);
      const res = await api.post('/api/families/upload/preview').attach('file', Buffer.from(fullGridCsv(3, 3)), 'small.csv');
      expect(res.status).toBe(503);
      expect(res.headers['retry-after']).toBe(String(apiThreadGate.retryAfterSeconds));
      expect(res.body).toEqual({ name: 'Busy', message: `The server is busy with other computations; try again in ${apiThreadGate.retryAfterSeconds} seconds.` });
    } finally {
      held.forEach((leave) => leave());
      // Each place handed back passes to the next in the queue, first come, first served.
      for (const next of queued) (await next)();
    }
    expect(apiThreadGate.load).toEqual({ running: 0, waiting: 0 });
    // With places free again the same file is read.
    const again = await (await signedIn(ctx, demo.physicist)).post('/api/families/upload/preview').attach('file', Buffer.from(fullGridCsv(3, 3)), 'small.csv');
    expect(again.status).toBe(200);
    expect(uploadPreviewSchema.parse(again.body).ok).toBe(true);
  });

  it('answers 503 with Retry-After before reading a file when the uploads held in memory are at their cap', async () => {
    const held = await Promise.all(Array.from({ length: uploadGate.maxRunning }, () => uploadGate.enter()));
    try {
      const api = await signedIn(ctx, demo.physicist);
      const res = await api.post('/api/families/upload/preview').attach('file', Buffer.from(fullGridCsv(3, 3)), 'small.csv');
      expect(res.status).toBe(503);
      expect(res.headers['retry-after']).toBe('5');
      expect(res.body).toEqual({ name: 'Busy', message: 'The server is receiving too many uploads at once; try again in 5 seconds.' });
    } finally {
      held.forEach((leave) => leave());
    }
    expect(uploadGate.load).toEqual({ running: 0, waiting: 0 });
  });
});
