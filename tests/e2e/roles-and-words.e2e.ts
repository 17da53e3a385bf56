import type { Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import { modulesResponseSchema } from '../../shared/api/modules';
import { demoModule } from '../../server/db/seed/demo-data';
import {
  baseUrl,
  convergedRun,
  demoPFamilyName,
  getJsonAs,
  openBrowser,
  pageProblems,
  saveScreenshot,
  shellNav,
  signIn,
  signInAs,
  visible,
  waitForVisibleText,
  type BrowserSession,
  type ViewportName,
} from './browser';

jest.setTimeout(300_000);

type Role = 'admin' | 'physicist' | 'grower' | 'viewer';

const emails: Record<Role, string> = {
  admin: 'ada@northlight.example',
  physicist: 'piet@northlight.example',
  grower: 'greta@northlight.example',
  viewer: 'vic@northlight.example',
};

/** Each role's navigation, from the one permission table (shared/api/permissions.ts). */
const tabsOf: Record<Role, string[]> = {
  admin: ['Materials', 'Designs', 'Runs', 'Growth', 'Team', 'Outbox', 'System'],
  physicist: ['Materials', 'Designs', 'Runs', 'Growth', 'Team', 'System'],
  grower: ['Materials', 'Growth', 'Team', 'System'],
  viewer: ['Materials', 'Designs', 'Runs', 'Growth', 'Team', 'System'],
};

/** Where each role starts at "/", and one page it may not use, reached by address, with the words that explain it. */
const startOf: Record<Role, string> = { admin: '/', physicist: '/', grower: '/growth', viewer: '/' };
const refusedOf: Record<Role, { path: string; words: RegExp } | null> = {
  admin: null,
  physicist: { path: '/team/audit', words: /^Your role, physicist, cannot see the audit trail; ask an admin of Northlight Sensors/ },
  grower: { path: '/runs', words: /^Your role, grower, cannot see designs, runs and modules; ask an admin of Northlight Sensors/ },
  viewer: { path: '/outbox', words: /^Your role, viewer, cannot see the outbox; ask an admin of Northlight Sensors/ },
};

const widths: ViewportName[] = ['phone', 'desktop'];

async function tabNames(page: Page): Promise<string[]> {
  const nav = shellNav(page);
  await nav.waitFor({ state: 'visible', timeout: 30_000 });
  return (await nav.getByRole('tab').allInnerTexts()).map((t) => t.trim());
}

/** No page at 390 px scrolls sideways. */
async function expectNoSidewaysScroll(page: Page): Promise<void> {
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
}

describe.each<Role>(['admin', 'physicist', 'grower', 'viewer'])('what a %s sees', (role) => {
  let session: BrowserSession;
  beforeAll(async () => {
    session = await openBrowser();
    await signInAs(session, emails[role]);
  });
  afterAll(async () => {
    await session.close();
  });

  it.each(widths)('starts on its own page with its own navigation, and is told why a page is not for it (%s)', async (width) => {
    const page = await session.newPage(width);
    await page.goto(`${baseUrl}/`);
    await page.waitForURL(`${baseUrl}${startOf[role]}`);
    expect(await tabNames(page)).toEqual(tabsOf[role]);
    await saveScreenshot(page, `role-${role}-start-${width}`);

    const refused = refusedOf[role];
    if (refused) {
      await page.goto(`${baseUrl}${refused.path}`);
      const notice = visible(page.getByTestId('role-refusal'));
      await notice.waitFor({ timeout: 30_000 });
      // The notice's title, then the explanation.
      expect((await notice.innerText()).split('\n').slice(1).join(' ').trim()).toMatch(refused.words);
      expect(await page.getByText('Try again').filter({ visible: true }).count()).toBe(0);
      if (width === 'phone') await expectNoSidewaysScroll(page);
      await saveScreenshot(page, `role-${role}-refused-${width}`);
      await visible(page.getByTestId('role-refusal-home')).click();
      await page.waitForURL(`${baseUrl}${startOf[role]}`);
    }
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(session)).toEqual([]);
  });
});

describe('a grower signing in on the sign-in page', () => {
  it('lands on her growth orders', async () => {
    const session = await openBrowser();
    try {
      const page = await session.newPage('phone');
      await signIn(page, emails.grower);
      await page.waitForURL(`${baseUrl}/growth`);
      await page.getByRole('heading', { name: 'Growth' }).filter({ visible: true }).waitFor({ timeout: 30_000 });
      await saveScreenshot(page, 'grower-after-sign-in-phone');
      expect(pageProblems(session)).toEqual([]);
    } finally {
      await session.close();
    }
  });
});

describe('a viewer on a module page', () => {
  let session: BrowserSession;
  beforeAll(async () => {
    session = await openBrowser();
    await signInAs(session, emails.viewer);
  });
  afterAll(async () => {
    await session.close();
  });

  it.each(widths)('reads the saved module as text, doping in powers of ten, with no form (%s)', async (width) => {
    const { modules } = modulesResponseSchema.parse(await getJsonAs(session, '/api/modules'));
    // The seeded demo module, by name: other test files save modules named
    // with a timestamp on the same stack, and those digits are not doping.
    const demo = modules.find((m) => m.name === demoModule.name);
    if (!demo) throw new Error(`the demo module "${demoModule.name}" is not seeded`);
    const page = await session.newPage(width);
    await page.goto(`${baseUrl}/modules/${demo.id}`);
    const facts = visible(page.getByTestId('module-facts'));
    await facts.waitFor({ timeout: 30_000 });
    await expect(visible(page.getByTestId('write-guard')).innerText()).resolves.toMatch(/Saving modules is for physicists and admins; you are signed in as viewer/);
    const text = await facts.innerText();
    expect(text).toMatch(/ × 10¹⁹\s?cm⁻³/);
    expect(text).not.toMatch(/\d{10,}/);
    expect(await page.locator('input, textarea').filter({ visible: true }).count()).toBe(0);
    expect(await page.getByText('Save changes').filter({ visible: true }).count()).toBe(0);
    await saveScreenshot(page, `module-viewer-facts-${width}`);
    await waitForVisibleText(page, 'Current of maximum Qc', 60_000);
    await visible(page.getByText('Current of maximum Qc', { exact: true })).scrollIntoViewIfNeeded();
    if (width === 'phone') await expectNoSidewaysScroll(page);
    await saveScreenshot(page, `module-viewer-${width}`);
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(session)).toEqual([]);
  });
});

describe('a physicist meets messages in the form’s words', () => {
  let session: BrowserSession;
  beforeAll(async () => {
    session = await openBrowser();
    await signInAs(session, emails.physicist);
  });
  afterAll(async () => {
    await session.close();
  });

  it.each(widths)('sees the API name a refused module setting by its label, beside the field and in the notice (%s)', async (width) => {
    const { families } = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
    const p = families.find((f) => demoPFamilyName.test(f.name))!;
    const n = families.find((f) => f.carrier === 'n' && f.kind === 'band')!;
    const page = await session.newPage(width);
    await page.goto(`${baseUrl}/modules/new`);
    await visible(page.getByTestId('field-module-name')).fill(`Words check ${width}`);
    await visible(page.getByTestId(`p-family-${p.id}`)).click();
    await visible(page.getByTestId(`n-family-${n.id}`)).click();
    // The form checks numbers only; the API checks the range and answers in the form's words.
    await visible(page.getByTestId('field-module-hotSide')).fill('50');
    await visible(page.getByText('Save module', { exact: true })).click();
    const notice = visible(page.getByTestId('module-save-error'));
    await notice.waitFor({ timeout: 30_000 });
    expect(await notice.innerText()).toMatch(/Hot-side temperature Th must be at least 100/);
    expect(await notice.innerText()).not.toMatch(/hotSide/);
    await waitForVisibleText(page, 'Hot-side temperature Th must be at least 100');
    await saveScreenshot(page, `module-words-${width}`);
    await page.close();
  });

  it.each(widths)('picks a family from the active ones, most recent first, archived on request (%s)', async (width) => {
    const page = await session.newPage(width);
    await page.goto(`${baseUrl}/designs/new`);
    const choices = visible(page.getByTestId('design-family-choices'));
    await choices.waitFor({ timeout: 30_000 });
    const chips = await choices.getByRole('radio').allInnerTexts();
    expect(chips.length).toBeGreaterThan(0);
    expect(chips.length).toBeLessThanOrEqual(9);
    expect(chips.join('\n')).not.toMatch(/archived/);
    await visible(page.getByTestId('design-family-show-archived')).click();
    if (width === 'phone') await expectNoSidewaysScroll(page);
    await saveScreenshot(page, `family-picker-${width}`);
    await page.close();
  });

  it.each(widths)('reads a family’s doping axis in the same notation as its text (%s)', async (width) => {
    const { families } = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
    const p = families.find((f) => demoPFamilyName.test(f.name))!;
    const page = await session.newPage(width);
    await page.goto(`${baseUrl}/materials/${p.id}`);
    await waitForVisibleText(page, p.name);
    const plot = visible(page.locator('canvas'));
    await plot.waitFor({ timeout: 60_000 });
    await plot.scrollIntoViewIfNeeded();
    // Let the Skia canvas draw its axes before the picture is taken.
    await page.waitForTimeout(3000);
    await saveScreenshot(page, `family-axes-${width}`);
    await page.close();
  });

  it('tells the two baselines of a run apart by dash, marker and legend', async () => {
    const runId = await convergedRun(session, { name: `Baselines ${Date.now().toString(36)}`, controlPoints: 5 });
    for (const width of widths) {
      const page = await session.newPage(width);
      await page.goto(`${baseUrl}/runs/${runId}`);
      const plot = visible(page.getByTestId('leg-plot-temperature'));
      await plot.waitFor({ timeout: 60_000 });
      await plot.scrollIntoViewIfNeeded();
      const legend = await plot.getByRole('list', { name: 'Legend' }).innerText();
      expect(legend).toMatch(/Best uniform\s*dashed, squares/);
      expect(legend).toMatch(/Local-best zT\s*dotted, stars/);
      await page.waitForTimeout(3000);
      await saveScreenshot(page, `run-baselines-${width}`);
      await page.close();
    }
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(session)).toEqual([]);
  });
});
