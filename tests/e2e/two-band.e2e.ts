import type { Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import { runDetailSchema } from '../../shared/api/runs';
import {
  baseUrl,
  demoPFamilyName,
  eventually,
  getJsonAs,
  openBrowser,
  pageProblems,
  postJsonAs,
  saveScreenshot,
  signInAs,
  waitForDrawnChart,
  type BrowserSession,
  type ViewportName,
} from './browser';

jest.setTimeout(420_000);

const visible = (page: Page, testId: string) => page.getByTestId(testId).filter({ visible: true }).first();
const button = (page: Page, name: string) => page.getByRole('button', { name }).filter({ visible: true }).first();

async function fill(page: Page, values: Record<string, string>): Promise<void> {
  for (const [field, text] of Object.entries(values)) await visible(page, `field-${field}`).fill(text);
}

describe('two-band (bipolar) families in a real browser', () => {
  let session: BrowserSession;
  const stamp = Date.now().toString(36);

  beforeAll(async () => {
    session = await openBrowser();
    await signInAs(session, 'piet@northlight.example');
  });

  afterAll(async () => {
    await session?.close();
  });

  it.each<ViewportName>(['phone', 'desktop'])('creates a two-band family through the form at %s width, after fixing a gap typed in meV', async (viewport) => {
    const page = await session.newPage(viewport);
    const name = `Two-band E2E ${viewport} ${stamp}`;
    await page.goto(`${baseUrl}/materials/new`);
    await fill(page, { effectiveMass: '1', mobility300: '350', latticeKappa300: '1', name, source: 'Invented for the browser test' });
    expect(await page.getByTestId('field-minority-bandGap').count()).toBe(0);
    await visible(page, 'bands-two').click();
    await fill(page, { 'minority-bandGap': '170', 'minority-bandGapSlope': '1e-4', 'minority-effectiveMass': '1', 'minority-mobility300': '600' });
    await button(page, 'Create family').click();
    await expect(visible(page, 'error-minority-bandGap').innerText()).resolves.toMatch(/Band gap at 0 K above 10 is implausible: .*meV/);
    await visible(page, 'field-minority-bandGap').scrollIntoViewIfNeeded();
    await saveScreenshot(page, `two-band-form-error-${viewport}`);

    await fill(page, { 'minority-bandGap': '0.2' });
    await button(page, 'Create family').click();
    await page.waitForURL(/\/materials\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name }).filter({ visible: true }).waitFor();
    await expect(visible(page, 'param-minority-bandGap').innerText()).resolves.toMatch(/0\.2\s*eV/);
    await expect(visible(page, 'param-minority-mobility300').innerText()).resolves.toMatch(/600\s*cm²\/\(V·s\)/);
    const plot = visible(page, 'plot-bipolar');
    await plot.scrollIntoViewIfNeeded();
    expect(await waitForDrawnChart(page, plot, 50, 60_000, 'glacier')).toBeGreaterThanOrEqual(50);
    // The 0.17 eV gap at 300 K: bipolar below ~5e18 cm⁻³ (the engine's 5 % crossing; the demo optimum stops at 5.3e18 with 4.6 %).
    await expect(visible(page, 'bipolar-onset-300').innerText()).resolves.toMatch(/At 300 K: bipolar below n = [1-9]\.\d\s×\s10¹⁸\scm⁻³/);
    await saveScreenshot(page, `two-band-plot-${viewport}`);
    await page.close();
  });

  it('a single-band family shows no bipolar plot', async () => {
    const created = (await postJsonAs(session, '/api/families', {
      name: `One band E2E ${stamp}`,
      source: 'Invented for the browser test',
      definition: { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 },
    })) as { family: { id: string } };
    const page = await session.newPage('desktop');
    await page.goto(`${baseUrl}/materials/${created.family.id}`);
    await visible(page, 'plot-seebeck').waitFor();
    await visible(page, 'param-minority').waitFor();
    expect(await page.getByTestId('plot-bipolar').count()).toBe(0);
    await page.close();
  });

  it.each<ViewportName>(['phone', 'desktop'])('says beside a run of the demo p family whether it is bipolar, on the run page and in the list, at %s width', async (viewport) => {
    const { families } = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
    const family = families.find((f) => demoPFamilyName.test(f.name))!;
    // Free to go from 1e17 to 1e20 cm⁻³ the optimiser stops just short of the bipolar region at the hot end (desktop);
    // held at or below 3e18 cm⁻³ (phone) the hot end is inside it (5 % at ~5e18 cm⁻³ at 300 K).
    const maxPerCm3 = viewport === 'phone' ? 3e18 : 1e20;
    const { design } = (await postJsonAs(session, '/api/designs', {
      name: `Bipolar E2E ${viewport} ${stamp}`, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e17, maxPerCm3, controlPoints: 5, starts: 1,
    })) as { design: { id: string } };
    const { run } = (await postJsonAs(session, `/api/designs/${design.id}/runs`, {})) as { run: { id: string } };
    const done = await eventually(async () => {
      const d = runDetailSchema.parse(await getJsonAs(session, `/api/runs/${run.id}`));
      if (d.run.state === 'failed' || d.run.state === 'cancelled') throw new Error(`the run ${d.run.state}`);
      return d.run.state === 'succeeded' ? d : undefined;
    }, 300, 'the run to converge');
    const share = done.run.bipolar!;
    expect(share).not.toBeNull();
    expect(share.bipolar).toBe(viewport === 'phone');
    const percent = new RegExp(`carry (at most )?${Math.floor(100 * share.share)}[.\\d]* % of the current`);

    const page = await session.newPage(viewport);
    await page.goto(`${baseUrl}/runs/${run.id}`);
    const note = visible(page, 'run-bipolar');
    await expect(note.innerText()).resolves.toMatch(share.bipolar ? /In the bipolar region: at the hot end/ : /Outside the bipolar region/);
    await expect(note.innerText()).resolves.toMatch(percent);
    await note.scrollIntoViewIfNeeded();
    await saveScreenshot(page, `run-bipolar-${viewport}`);

    await page.goto(`${baseUrl}/designs/${design.id}`);
    const row = visible(page, `run-row-${run.id}`);
    await expect(row.getByTestId('run-bipolar').first().innerText()).resolves.toMatch(percent);
    await row.scrollIntoViewIfNeeded();
    await saveScreenshot(page, `run-list-bipolar-${viewport}`);
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(session)).toEqual([]);
  });
});
