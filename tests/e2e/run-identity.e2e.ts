/**
 * Run identity, tab titles and the live progress line in a real browser, at
 * phone and desktop widths: two runs of one design read apart in the runs
 * list and the comparison (number, launch time, starts, who launched it);
 * every page names its tab; the live line puts each current beside its own
 * result.
 */
import type { Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import { growthOrderSchema } from '../../shared/api/growth';
import { runDetailSchema, runSummarySchema, type RunSummary } from '../../shared/api/runs';
import {
  baseUrl, demoPFamilyName, eventually, getJsonAs, openBrowser, pageProblems, postJsonAs, saveScreenshot, signInAs, visible,
  type BrowserSession, type ViewportName,
} from './browser';

jest.setTimeout(900_000);

const widths: ViewportName[] = ['phone', 'desktop'];

async function putJsonAs(session: BrowserSession, path: string, data: unknown): Promise<void> {
  const response = await session.context.request.put(`${baseUrl}${path}`, { data, headers: { Origin: baseUrl } });
  if (!response.ok()) throw new Error(`PUT ${path} answered ${response.status()}: ${await response.text()}`);
}

async function finished(session: BrowserSession, id: string): Promise<RunSummary> {
  return eventually(async () => {
    const d = runDetailSchema.parse(await getJsonAs(session, `/api/runs/${id}`));
    if (d.run.state === 'failed' || d.run.state === 'cancelled') throw new Error(`the run ${d.run.state}`);
    return d.run.state === 'succeeded' ? d.run : undefined;
  }, 420, 'the run to converge');
}

/** The tab's title once the page has settled on it (titles follow data that loads). */
async function titleBecomes(page: Page, expected: string): Promise<void> {
  await page.waitForFunction((t) => document.title === t, expected, { timeout: 30_000 }).catch(async () => {
    throw new Error(`title of ${page.url()} is "${await page.title()}", expected "${expected}"`);
  });
}

describe('runs told apart, pages named, progress worded', () => {
  let ada: BrowserSession;
  let anonymous: BrowserSession;
  const designName = `Identity leg ${Date.now()}`;
  const batch = `NL-TITLE-${Date.now() % 100000}`;
  let designId = '';
  let familyId = '';
  let familyName = '';
  let few: RunSummary;
  let more: RunSummary;
  let orderId = '';

  beforeAll(async () => {
    ada = await openBrowser();
    anonymous = await openBrowser();
    await signInAs(ada, 'ada@northlight.example');
    const { families } = familiesResponseSchema.parse(await getJsonAs(ada, '/api/families'));
    const family = families.find((f) => demoPFamilyName.test(f.name));
    if (!family) throw new Error('the demo p-type band-model family is missing');
    familyId = family.id;
    familyName = family.name;
    const input = { name: designName, familyId, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 5, starts: 1 };
    designId = ((await postJsonAs(ada, '/api/designs', input)) as { design: { id: string } }).design.id;
    const launch = async () => runSummarySchema.parse(((await postJsonAs(ada, `/api/designs/${designId}/runs`, {})) as { run: unknown }).run);
    few = await finished(ada, (await launch()).id);
    // The same design, searched harder: only the run's own facts tell the two apart.
    await putJsonAs(ada, `/api/designs/${designId}`, { ...input, starts: 2 });
    more = await finished(ada, (await launch()).id);
    orderId = growthOrderSchema.parse(((await postJsonAs(ada, `/api/runs/${few.id}/release`, { batch })) as { order: unknown }).order).id;
  });

  afterAll(async () => {
    await ada?.close();
    await anonymous?.close();
  });

  it('numbers runs per team, one after the other, with starts and the launcher', () => {
    expect(more.number).toBe(few.number + 1);
    expect([few.starts, more.starts]).toEqual([1, 2]);
    expect(few.launchedBy).toBe('Ada Lindqvist');
  });

  it.each(widths)('the runs list, the comparison and the curves page tell the two runs apart (%s)', async (viewport) => {
    const page = await ada.newPage(viewport);
    try {
      await page.goto(`${baseUrl}/runs`);
      for (const [run, starts] of [[few, '1 start'], [more, '2 starts']] as const) {
        const row = visible(page.getByTestId(`run-row-${run.id}`));
        await row.waitFor();
        await expect(row.getByTestId('run-row-name').innerText()).resolves.toBe(`Run ${run.number} · ${designName}`);
        await expect(row.getByTestId('run-row-provenance').innerText()).resolves.toMatch(new RegExp(`^\\d{1,2} \\w{3} \\d{4}, \\d{2}:\\d{2} UTC · ${starts} · Ada Lindqvist$`));
      }
      await saveScreenshot(page, `run-identity-list-${viewport}`);

      await page.goto(`${baseUrl}/runs/compare?ids=${few.id},${more.id}`);
      const table = visible(page.getByTestId('compare-table'));
      await table.waitFor();
      const chipFew = await visible(page.getByTestId(`pick-run-${few.id}`)).innerText();
      const chipMore = await visible(page.getByTestId(`pick-run-${more.id}`)).innerText();
      expect(chipFew).toMatch(new RegExp(`^Run ${few.number} · ${designName} · ΔT .+ · 1 start · Ada Lindqvist$`));
      expect(chipMore).toMatch(new RegExp(`^Run ${more.number} · ${designName} · ΔT .+ · 2 starts · Ada Lindqvist$`));
      expect(chipFew).not.toBe(chipMore);
      await expect(table.innerText()).resolves.toMatch(new RegExp(`Run ${few.number}[\\s\\S]*Run ${more.number}`));
      await expect(visible(page.getByTestId('compare-table-row-starts')).innerText()).resolves.toMatch(/Search starts\s+1\s+2/);
      await visible(page.getByTestId('compare-table-row-launched')).waitFor();
      await saveScreenshot(page, `run-identity-compare-${viewport}`);
      await visible(page.getByTestId('compare-table-row-starts')).scrollIntoViewIfNeeded();
      await saveScreenshot(page, `run-identity-compare-settings-${viewport}`);

      await page.goto(`${baseUrl}/runs/${more.id}/curves`);
      await visible(page.getByRole('link', { name: `Back to Run ${more.number} · ${designName}` })).waitFor();
      await visible(page.getByRole('heading', { name: `Operating curves of Run ${more.number}` })).waitFor();

      await page.goto(`${baseUrl}/growth`);
      await visible(page.getByText(`Run ${few.number} · ${designName}`)).waitFor();
    } finally {
      await page.close();
    }
  });

  it.each(widths)('every page names its browser tab, each differently (%s)', async (viewport) => {
    const page = await ada.newPage(viewport);
    const expected: Array<[string, string]> = [
      ['/', 'Materials · Frostgrade'],
      [`/materials/${familyId}`, `${familyName} · Materials · Frostgrade`],
      ['/materials/new', 'New band-model family · Materials · Frostgrade'],
      ['/materials/upload', 'Upload a measured table · Materials · Frostgrade'],
      ['/designs', 'Designs · Frostgrade'],
      ['/designs/new', 'New design · Designs · Frostgrade'],
      [`/designs/${designId}`, `${designName} · Designs · Frostgrade`],
      [`/designs/${designId}/edit`, `Edit ${designName} · Designs · Frostgrade`],
      ['/runs', 'Runs · Frostgrade'],
      [`/runs/${few.id}`, `Run ${few.number} · Runs · Frostgrade`],
      [`/runs/${more.id}`, `Run ${more.number} · Runs · Frostgrade`],
      [`/runs/${more.id}/curves`, `Run ${more.number} operating curves · Runs · Frostgrade`],
      [`/runs/compare?ids=${few.id},${more.id}`, 'Compare · Runs · Frostgrade'],
      ['/modules', 'Modules · Frostgrade'],
      ['/modules/new', 'New module · Modules · Frostgrade'],
      ['/growth', 'Growth · Frostgrade'],
      [`/growth/${orderId}`, `Growth order ${batch} · Growth · Frostgrade`],
      ['/team', 'Team · Frostgrade'],
      ['/team/audit', 'Audit trail · Team · Frostgrade'],
      ['/account', 'Your account · Team · Frostgrade'],
      ['/outbox', 'Outbox · Frostgrade'],
      ['/system', 'System · Frostgrade'],
      ['/no-such-page', 'Nothing here · Frostgrade'],
    ];
    const signedOut: Array<[string, string]> = [
      ['/sign-in', 'Sign in · Frostgrade'],
      ['/sign-up', 'Start a team · Frostgrade'],
      ['/forgot-password', 'Forgot your password? · Frostgrade'],
    ];
    expect(new Set([...expected, ...signedOut].map(([, t]) => t)).size).toBe(expected.length + signedOut.length);
    try {
      for (const [path, title] of expected) {
        await page.goto(`${baseUrl}${path}`);
        await titleBecomes(page, title);
      }
      // The list stays mounted under a run opened from it: going back names the tab after the list again.
      await page.goto(`${baseUrl}/runs`);
      await titleBecomes(page, 'Runs · Frostgrade');
      await visible(page.getByTestId(`run-row-${few.id}`)).getByRole('link').first().click();
      await titleBecomes(page, `Run ${few.number} · Runs · Frostgrade`);
      await visible(page.getByRole('link', { name: 'Back to Runs' })).click();
      await titleBecomes(page, 'Runs · Frostgrade');
    } finally {
      await page.close();
    }
    const out = await anonymous.newPage(viewport);
    try {
      for (const [path, title] of signedOut) {
        await out.goto(`${baseUrl}${path}`);
        await titleBecomes(out, title);
      }
    } finally {
      await out.close();
    }
  });

  it('the live line puts the best beside its own current and the start being searched beside its own', async () => {
    const input = { name: designName, familyId, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 5, starts: 600 };
    await putJsonAs(ada, `/api/designs/${designId}`, input);
    const long = runSummarySchema.parse(((await postJsonAs(ada, `/api/designs/${designId}/runs`, {})) as { run: unknown }).run);
    const pages = await Promise.all(widths.map((w) => ada.newPage(w)));
    try {
      for (const [k, page] of pages.entries()) {
        await page.goto(`${baseUrl}/runs/${long.id}`);
        const start = visible(page.getByTestId('start-progress'));
        await start.waitFor({ timeout: 300_000 });
        await expect(visible(page.getByTestId('best-current')).innerText()).resolves.toMatch(/^at \d+(\.\d+)?\sA$/);
        await expect(start.innerText()).resolves.toMatch(/^Start \d+ of 600, searching: best ΔT of this start -?\d+(\.\d+)?\sK at \d+(\.\d+)?\sA$/);
        await expect(visible(page.getByTestId('best-so-far')).innerText()).resolves.toMatch(/Best ΔT so far over all starts/);
        await saveScreenshot(page, `run-identity-progress-${widths[k]}`);
      }
      // The line agrees with the stored payload: the best's current is the best's, not the start's.
      const d = runDetailSchema.parse(await getJsonAs(ada, `/api/runs/${long.id}`));
      expect(d.progress?.bestCurrent).not.toBeNull();
      expect(d.progress?.start?.of).toBe(600);
    } finally {
      await postJsonAs(ada, `/api/runs/${long.id}/cancel`, {}).catch(() => undefined);
      await Promise.all(pages.map((p) => p.close()));
    }
  });

  it('shows no page errors', () => {
    expect(pageProblems(ada, anonymous)).toEqual([]);
  });
});
