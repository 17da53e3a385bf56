import type { Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import { coolersResponseSchema } from '../../shared/api/coolers';
import { modulesResponseSchema } from '../../shared/api/modules';
import {
  baseUrl,
  chooseCsvFile,
  convergedRun,
  demoPFamilyName,
  eventually,
  getJsonAs,
  openBrowser,
  pageProblems,
  postJsonAs,
  saveScreenshot,
  signInAs,
  visible,
  type BrowserSession,
} from './browser';
import { overlapProblems, sidewaysProblems, tableReach } from './layout-checks';
import { sparseGridCsv } from '../server/fixtures/table-files';

jest.setTimeout(600_000);

/** The widths every screen is checked at: small and common phones, a tablet (the narrowest side-rail layout), a desktop. */
const widths = [360, 390, 768, 1280] as const;
const height = 844;

/** A screen to visit: its address, and optionally what to do once it has loaded (choose a file, open a tab). */
type Screen = { name: string; path: string; prepare?: (page: Page) => Promise<void>; tables?: boolean; shot?: string };

/** Loaded: the title is shown, nothing says "Loading…", and the network has been quiet for a moment. */
async function settled(page: Page): Promise<void> {
  await page.locator('[role="heading"][aria-level="1"]').filter({ visible: true }).first().waitFor({ timeout: 60_000 });
  await page.waitForLoadState('networkidle', { timeout: 30_000 }).catch(() => undefined);
  await page.getByText(/^Loading/).filter({ visible: true }).first().waitFor({ state: 'hidden', timeout: 60_000 });
  await page.waitForTimeout(300);
}

async function putJsonAs(session: BrowserSession, path: string, data: unknown): Promise<void> {
  const response = await session.context.request.put(`${baseUrl}${path}`, { data, headers: { Origin: baseUrl } });
  if (!response.ok()) throw new Error(`PUT ${path} answered ${response.status()}: ${await response.text()}`);
}

/** Room-temperature S and σ every 0.25 mm along a 1.5 mm leg: plausible numbers, not a fit to any zone. */
function asGrownCsv(): string {
  const lines = ['position_mm,seebeck_uV_per_K,sigma_S_per_cm'];
  for (let mm = 0.1; mm < 1.5; mm += 0.25) lines.push(`${mm.toFixed(2)},${(200 + 60 * mm).toFixed(1)},${(900 - 300 * mm).toFixed(1)}`);
  return `${lines.join('\n')}\n`;
}

describe('every screen fits a phone, a tablet and a desktop: no sideways page, no overlapping cards, every table column reachable', () => {
  let admin: BrowserSession;
  let page: Page;
  const screens: Screen[] = [];
  const stamp = Date.now().toString(36).toUpperCase();
  /** Tables that scrolled inside their card at a phone width: at least the wide numeric ones must. */
  const scrolledOnPhone = new Set<string>();

  beforeAll(async () => {
    admin = await openBrowser();
    await signInAs(admin, 'ada@northlight.example');
    const { families } = familiesResponseSchema.parse(await getJsonAs(admin, '/api/families'));
    const family = families.find((f) => demoPFamilyName.test(f.name))!;
    const { modules } = modulesResponseSchema.parse(await getJsonAs(admin, '/api/modules'));
    // The seeded demo cascade and matched couple, by name.
    const { coolers } = coolersResponseSchema.parse(await getJsonAs(admin, '/api/coolers'));
    const demoCascade = coolers.find((c) => c.kind === 'cascade' && c.name.startsWith('Demo: detector cascade'))!;
    const demoCouple = coolers.find((c) => c.kind === 'couple' && c.name.startsWith('Demo: matched couple'))!;
    // Two short runs of the demo family to open, compare and release.
    const [runA, runB] = await Promise.all([
      convergedRun(admin, { name: `Layout leg A ${stamp}`, controlPoints: 3 }, 300),
      convergedRun(admin, { name: `Layout leg B ${stamp}`, controlPoints: 4 }, 300),
    ]);
    const run = (await getJsonAs(admin, `/api/runs/${runA}`)) as { design: { id: string } };
    // A two-point sweep of the hot side: short runs, finished or not by the time its page is checked.
    const { sweep } = (await postJsonAs(admin, `/api/designs/${run.design.id}/sweeps`, { parameter: 'hotSide', values: [295, 305] })) as { sweep: { id: string } };
    const { order } = (await postJsonAs(admin, `/api/runs/${runA}/release`, { batch: `Layout ${stamp}`, zones: 3 })) as { order: { id: string } };
    // Growing needs the sheet's zones and bands: wait for the worker to have computed them.
    await eventually(async () => {
      const detail = (await getJsonAs(admin, `/api/growth-orders/${order.id}`)) as { order: { sheetStatus: string } };
      if (detail.order.sheetStatus === 'failed') throw new Error('the growth sheet failed');
      return detail.order.sheetStatus === 'ready' ? true : undefined;
    }, 180, 'the growth sheet to be ready');
    for (const state of ['accepted', 'growing', 'grown']) await putJsonAs(admin, `/api/growth-orders/${order.id}/state`, { state });
    screens.push(
      { name: 'materials', path: '/' },
      { name: 'family', path: `/materials/${family.id}`, shot: 'versions' },
      { name: 'family-edit', path: `/materials/${family.id}/edit` },
      { name: 'family-new', path: '/materials/new' },
      { name: 'family-upload', path: '/materials/upload', tables: true, prepare: (p) => chooseCsvFile(p, 'sparse.csv', sparseGridCsv(12)).then(() => p.getByTestId('upload-preview').filter({ visible: true }).first().waitFor()) },
      { name: 'designs', path: '/designs' },
      { name: 'design-new', path: '/designs/new' },
      { name: 'design', path: `/designs/${run.design.id}` },
      { name: 'runs', path: '/runs' },
      { name: 'sweep', path: `/sweeps/${sweep.id}` },
      { name: 'run', path: `/runs/${runA}`, tables: true },
      { name: 'curves', path: `/runs/${runA}/curves`, tables: true },
      { name: 'compare', path: `/runs/compare?ids=${runA},${runB}&modules=${modules[0]!.id}`, tables: true },
      { name: 'modules', path: '/modules' },
      { name: 'module-new', path: '/modules/new' },
      { name: 'module', path: `/modules/${modules[0]!.id}`, tables: true },
      { name: 'stages', path: '/stages' },
      { name: 'stages-new-cascade', path: '/stages/new-cascade' },
      { name: 'stages-new-couple', path: '/stages/new-couple' },
      { name: 'stages-cascade', path: `/stages/${demoCascade.id}`, tables: true },
      { name: 'stages-couple', path: `/stages/${demoCouple.id}` },
      { name: 'stages-compare', path: '/stages/compare' },
      { name: 'growth-orders', path: '/growth' },
      {
        name: 'growth-order',
        path: `/growth/${order.id}`,
        tables: true,
        prepare: async (p) => {
          await p.getByTestId('growth-sheet').filter({ visible: true }).first().waitFor({ timeout: 120_000 });
          await chooseCsvFile(p, 'as-grown.csv', asGrownCsv());
          await p.getByTestId('measurement-rows').filter({ visible: true }).first().waitFor();
        },
      },
      {
        name: 'growth-report',
        path: `/growth/${order.id}`,
        tables: true,
        shot: 'measurement-report',
        prepare: async (p) => {
          await p.getByTestId('growth-sheet').filter({ visible: true }).first().waitFor({ timeout: 120_000 });
          await chooseCsvFile(p, 'as-grown.csv', asGrownCsv());
          await visible(p.getByRole('button', { name: 'Upload measurements' })).click();
          await p.getByTestId('measurement-report').filter({ visible: true }).first().waitFor({ timeout: 60_000 });
        },
      },
      { name: 'team', path: '/team' },
      { name: 'audit', path: '/team/audit' },
      { name: 'account', path: '/account' },
      { name: 'outbox', path: '/outbox' },
      { name: 'system', path: '/system' },
    );
    page = await admin.newPage('phone');
  });

  afterAll(async () => {
    await admin?.close();
  });

  it('holds at 360, 390, 768 and 1280 px on every screen', async () => {
    const problems: string[] = [];
    for (const screen of screens) {
      await page.setViewportSize({ width: widths[0], height });
      await page.goto(`${baseUrl}${screen.path}`);
      await settled(page);
      await screen.prepare?.(page);
      for (const width of widths) {
        await page.setViewportSize({ width, height });
        await page.waitForTimeout(250);
        await page.evaluate(() => window.scrollTo(0, 0));
        const at = `${screen.name} at ${width} px`;
        for (const p of await sidewaysProblems(page)) problems.push(`${at}: ${p}`);
        for (const p of await overlapProblems(page)) problems.push(`${at}: ${p}`);
        for (const t of await tableReach(page)) {
          for (const p of t.problems) problems.push(`${at}: table "${t.label}": ${p}`);
          if (t.overflows && width < 768) scrolledOnPhone.add(t.label);
        }
        if (screen.tables && (width === 390 || width === 1280)) await tableShots(page, screen.name, width);
        if (screen.shot && (width === 390 || width === 1280)) {
          await visible(page.getByTestId(screen.shot)).scrollIntoViewIfNeeded();
          await saveScreenshot(page, `layout-${screen.name}-${width}`);
        }
      }
    }
    expect(problems).toEqual([]);
    // The wide numeric tables scroll inside their card on a phone rather than vanish off its edge.
    expect([...scrolledOnPhone]).toEqual(expect.arrayContaining(['Profile along the leg', 'Runs side by side', 'Couples at the same total leg area', 'Parsed rows']));
    expect(pageProblems(admin)).toEqual([]);
  });
});

/** A screenshot of each visible table, scrolled into view, to look at. */
async function tableShots(page: Page, screen: string, width: number): Promise<void> {
  const tables = page.locator('[role="table"]').filter({ visible: true });
  const count = await tables.count();
  for (let i = 0; i < count; i++) {
    const table = tables.nth(i);
    const label = ((await table.getAttribute('aria-label')) ?? `table-${i}`).toLowerCase().replace(/[^a-z0-9]+/g, '-');
    await table.scrollIntoViewIfNeeded();
    await page.waitForTimeout(150);
    await saveScreenshot(page, `layout-${screen}-${label}-${width}`);
    // Scrolled to its last column (a phone): the held first column and the cue, to look at.
    const scrolled = await table.evaluate((el) => {
      let s = el.parentElement;
      while (s && !['auto', 'scroll'].includes(getComputedStyle(s).overflowX)) s = s.parentElement;
      if (!s || s.scrollWidth <= s.clientWidth + 1) return false;
      s.scrollLeft = s.scrollWidth;
      return true;
    });
    if (scrolled) {
      await page.waitForTimeout(150);
      await saveScreenshot(page, `layout-${screen}-${label}-${width}-scrolled`);
      await table.evaluate((el) => el.closest('[data-side-scroll="scroller"]')?.scrollTo({ left: 0 }));
    }
  }
}
