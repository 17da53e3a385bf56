import { apiErrorBodySchema, familyDetailResponseSchema, familiesResponseSchema, maxUploadBytes, uploadPreviewSchema, uploadSavedSchema } from '../../shared/api';
import { familyFromMaterial, parseCase, propertiesAt } from '../../shared/engine';
import { parseTableCsv } from '../../shared/families/parse-table-csv';
import { MaterialFamily, Team } from '../../server/db/entities';
import { otherTeam } from '../../server/db/seed/demo-data';
import { insertFamily } from '../../server/services/family-service';
import { demo, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
let api: Awaited<ReturnType<typeof signedIn>>;
beforeAll(async () => {
  ctx = await openContext();
  api = await signedIn(ctx, demo.physicist);
});
afterAll(async () => { await ctx.close(); });

const band = { kind: 'band', carrier: 'p', effectiveMass: 1.2, mobility300: 280, mobilityExponent: -1.5, latticeKappa300: 0.9, latticeKappaExponent: -1 } as const;
const unique = (stem: string): string => `${stem} ${Date.now()}-${Math.round(Math.random() * 1e6)}`;
const familyCount = (): Promise<number> => ctx.ds.getRepository(MaterialFamily).count();

/** An invented, plausible grid (µV/K, S/cm, W/(m·K)). */
function csv(dopings = [1e18, 1e19, 1e20], temps = [250, 300, 350]): string {
  const rows = dopings.flatMap((n) => temps.map((t) => [n, t, 240 - 70 * Math.log10(n / 1e18) + 0.1 * (t - 300), 80 * (n / 1e18) ** 0.9 * (300 / t), 1.1 + 0.0002 * n / 1e18].join(',')));
  return ['n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K', ...rows].join('\n');
}

async function create(name = unique('Test alloy')): Promise<string> {
  const res = await api.post('/api/families').send({ name, source: 'test: invented parameters', summary: 'v1', definition: band });
  expect(res.status).toBe(201);
  return res.body.family.id as string;
}

describe('create, read, edit as versions', () => {
  it('creates a band-model family and reads back its definition as version 1', async () => {
    const id = await create();
    const d = familyDetailResponseSchema.parse((await api.get(`/api/families/${id}`)).body);
    expect(d.family).toMatchObject({ kind: 'band', carrier: 'p', version: 1, archived: false, isDemo: false });
    expect(d.current.definition).toEqual(band);
    expect(d.versions.map((v) => v.version)).toEqual([1]);
  });

  it('names the offending field and writes nothing for a bad definition', async () => {
    const before = await familyCount();
    const res = await api.post('/api/families').send({ name: unique('Bad'), source: 'x', definition: { ...band, effectiveMass: 'NaN' } });
    expect(res.status).toBe(400);
    expect(apiErrorBodySchema.parse(res.body).errors).toEqual([expect.objectContaining({ field: 'definition.effectiveMass' })]);
    const noSource = await api.post('/api/families').send({ name: unique('Bad'), source: '', definition: band });
    expect(noSource.body.errors[0].field).toBe('source');
    const ragged = await api.post('/api/families').send({ name: unique('Ragged'), source: 'x', definition: { kind: 'table', rows: parseTableCsv(csv()).rows.slice(1).map(({ line: _l, ...r }) => r) } });
    expect(ragged.status).toBe(400);
    expect(ragged.body.errors[0].field).toMatch(/^definition\.rows/);
    expect(await familyCount()).toBe(before);
  });

  it('refuses a second family with the same name in the team (any case)', async () => {
    const name = unique('Twin');
    await create(name);
    const res = await api.post('/api/families').send({ name: name.toUpperCase(), source: 'x', definition: band });
    expect(res.status).toBe(409);
    expect(res.body.errors[0].field).toBe('name');
  });

  it('an edit of content writes version 2 and keeps version 1 unchanged; a rename writes no version', async () => {
    const id = await create();
    const edited = await api.put(`/api/families/${id}`).send({ definition: { ...band, mobility300: 320 }, summary: 'v2' });
    expect(edited.status).toBe(200);
    expect(edited.body.family.version).toBe(2);
    const v1 = familyDetailResponseSchema.parse((await api.get(`/api/families/${id}/versions/1`)).body);
    expect(v1.current).toMatchObject({ version: 1, summary: 'v1', definition: band });
    const renamed = await api.put(`/api/families/${id}`).send({ name: unique('Renamed') });
    expect(renamed.body.family.version).toBe(2);
    const kind = await api.put(`/api/families/${id}`).send({ definition: { kind: 'constant', seebeck: 2e-4, sigma: 1e5, kappa: 1.5 } });
    expect(kind.status).toBe(400);
    expect(kind.body.errors[0].field).toBe('definition.kind');
    expect((await api.get(`/api/families/${id}/versions/3`)).status).toBe(404);
  });

  it('the database itself refuses to change a stored version', async () => {
    const id = await create();
    await expect(ctx.ds.query(`UPDATE material_family_version SET summary = 'tampered' WHERE family_id = $1`, [id])).rejects.toThrow(/immutable/);
  });

  it('duplicates the current version into a new family and archives / unarchives', async () => {
    const id = await create();
    const dup = await api.post(`/api/families/${id}/duplicate`).send({ name: unique('Copy') });
    expect(dup.status).toBe(201);
    const copy = familyDetailResponseSchema.parse((await api.get(`/api/families/${dup.body.family.id}`)).body);
    expect(copy.current.definition).toEqual(band);
    expect(copy.current.source).toMatch(/Duplicated from/);
    await api.post(`/api/families/${id}/archive`).expect(200);
    const active = familiesResponseSchema.parse((await api.get('/api/families')).body);
    const archived = familiesResponseSchema.parse((await api.get('/api/families?archived=1')).body);
    expect(active.families.map((f) => f.id)).not.toContain(id);
    expect(archived.families.map((f) => f.id)).toContain(id);
    await api.post(`/api/families/${id}/unarchive`).expect(200);
  });
});

describe('another team\'s family is invisible', () => {
  it('answers 404 to every route for a forged or malformed id, and changes nothing', async () => {
    const other = await ctx.ds.getRepository(Team).findOneByOrFail({ slug: otherTeam.slug });
    const theirs = await insertFamily(ctx.ds.manager, other, { name: unique('Harbour secret'), summary: '', source: 'theirs', definition: band }, 'them');
    const calls = [
      api.get(`/api/families/${theirs.id}`),
      api.get(`/api/families/${theirs.id}/versions/1`),
      api.put(`/api/families/${theirs.id}`).send({ summary: 'mine now' }),
      api.post(`/api/families/${theirs.id}/duplicate`).send({ name: unique('Stolen') }),
      api.post(`/api/families/${theirs.id}/archive`),
      api.get(`/api/families/${theirs.id}/export.csv`),
      api.get('/api/families/not-a-uuid'),
    ];
    for (const res of await Promise.all(calls)) expect(res.status).toBe(404);
    const after = await ctx.ds.getRepository(MaterialFamily).findOneByOrFail({ id: theirs.id });
    expect(after).toMatchObject({ currentVersion: 1, archived: false });
  });
});

describe('CSV upload', () => {
  it('previews without saving, then saves all of it', async () => {
    const before = await familyCount();
    const prev = await api.post('/api/families/upload/preview').attach('file', Buffer.from(csv()), 'batch.csv');
    expect(prev.status).toBe(200);
    const p = uploadPreviewSchema.parse(prev.body);
    expect(p).toMatchObject({ ok: true, rowCount: 9, carrier: 'p' });
    expect(await familyCount()).toBe(before);
    const name = unique('Uploaded batch');
    const saved = await api.post('/api/families/upload').field('name', name).field('source', 'Hall and Seebeck on 9 invented samples').attach('file', Buffer.from(csv()), 'batch.csv');
    expect(saved.status).toBe(201);
    const s = uploadSavedSchema.parse(saved.body);
    const d = familyDetailResponseSchema.parse((await api.get(`/api/families/${s.family.id}`)).body);
    expect(d.current.definition.kind).toBe('table');
    expect(d.current.definition.kind === 'table' && d.current.definition.rows).toHaveLength(9);
  });

  it('an upload with errors saves nothing and locates every error', async () => {
    const before = await familyCount();
    const bad = csv().replace(/\n([^,]+,)250,/, '\n$1abc,');
    const res = await api.post('/api/families/upload').field('name', unique('Broken')).field('source', 'x').attach('file', Buffer.from(bad), 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.errors).toEqual(expect.arrayContaining([expect.objectContaining({ field: 'file:line 2:temperature_K' })]));
    expect(await familyCount()).toBe(before);
  });

  it('refuses empty, binary and missing files, naming the field', async () => {
    const empty = await api.post('/api/families/upload/preview').attach('file', Buffer.alloc(0), 'empty.csv');
    expect(empty.status).toBe(400);
    expect(empty.body.errors[0].field).toBe('file');
    const binary = await api.post('/api/families/upload/preview').attach('file', Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00]), 'sheet.xlsx');
    expect(binary.body.errors[0].message).toMatch(/not text/);
    const none = await api.post('/api/families/upload/preview').field('name', 'x');
    expect(none.status).toBe(400);
    const wrongField = await api.post('/api/families/upload/preview').attach('document', Buffer.from(csv()), 'a.csv');
    expect(wrongField.status).toBe(400);
  });

  it('refuses a 50 MB file from its announced size, and one just over the limit while reading', async () => {
    const before = await familyCount();
    const huge = await api.post('/api/families/upload').field('name', unique('Huge')).field('source', 'x').attach('file', Buffer.alloc(50 * 1024 * 1024, 0x31), 'huge.csv');
    expect(huge.status).toBe(413);
    expect(huge.body.errors[0].field).toBe('file');
    const over = await api.post('/api/families/upload/preview').attach('file', Buffer.alloc(maxUploadBytes + 1000, 0x31), 'over.csv');
    expect(over.status).toBe(413);
    expect(await familyCount()).toBe(before);
  });
});

describe('export', () => {
  it('a measured family exported as CSV uploads back to the same points', async () => {
    const saved = await api.post('/api/families/upload').field('name', unique('Round trip')).field('source', 'x').attach('file', Buffer.from(csv()), 'a.csv');
    const res = await api.get(`/api/families/${saved.body.family.id}/export.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="?.*-v1\.csv"?$/);
    const again = parseTableCsv(res.text);
    expect(again.ok).toBe(true);
    const original = parseTableCsv(csv()).rows;
    again.rows.forEach((r, k) => {
      expect(r.seebeck / original[k]!.seebeck).toBeCloseTo(1, 7);
      expect(r.sigma / original[k]!.sigma).toBeCloseTo(1, 7);
    });
  });

  it('a band model exports as JSON usable in a leg case, and as CSV sampled from the model', async () => {
    const id = await create();
    const json = await api.get(`/api/families/${id}/export.json`);
    const checked = parseCase({ hotSide: 300, length: 1e-3, area: 1e-6, current: 0.5, material: json.body.material, doping: 3e19 }, 'solve');
    expect(checked).toBeTruthy();
    const sampled = parseTableCsv((await api.get(`/api/families/${id}/export.csv`)).text);
    expect(sampled.ok).toBe(true);
    expect(sampled.coverage.dopings).toHaveLength(13);
    const model = familyFromMaterial(band);
    const r = sampled.rows[40]!;
    expect(r.seebeck / propertiesAt(model, r.perCm3, r.temperature).seebeck).toBeCloseTo(1, 6);
  });
});
