import type { Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import {
  baseUrl,
  getJsonAs,
  openBrowser,
  pageProblems,
  saveScreenshot,
  signInAs,
  waitForDrawnChart,
  waitForVisibleText,
  type BrowserSession,
} from './browser';
import { sparseGridCsv } from '../server/fixtures/table-files';

jest.setTimeout(240_000);

const header = 'n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K';
const dopings = [5e18, 1e19, 2e19, 5e19, 1e20];
const temperatures = [250, 300, 350];

/**
 * Invented but plausible numbers from simple formulas: S falls with log n
 * and rises with T, σ ∝ n·T^-1.5, κ = lattice (∝ 1/T) + Wiedemann–Franz.
 */
function measuredCsv(): string {
  const lines = [header];
  for (const n of dopings) {
    for (const t of temperatures) {
      const seebeck = 190 * Math.pow(t / 300, 0.4) - 75 * Math.log10(n / 1e19);
      const sigma = 750 * (n / 1e19) * Math.pow(t / 300, -1.5);
      const kappa = 1.1 * (300 / t) + 2.44e-8 * sigma * 100 * t;
      lines.push([n.toExponential(), t, seebeck.toFixed(1), sigma.toFixed(1), kappa.toFixed(3)].join(','));
    }
  }
  return `${lines.join('\n')}\n`;
}

/** Line 4 (the third data row) has a Seebeck value that is not a number. */
function brokenCsv(): string {
  const lines = measuredCsv().trim().split('\n');
  const cells = lines[3].split(',');
  cells[2] = '21O.5';
  lines[3] = cells.join(',');
  return `${lines.join('\n')}\n`;
}

const visible = (page: Page, testId: string) => page.getByTestId(testId).filter({ visible: true }).first();

async function openUpload(page: Page): Promise<void> {
  await page.goto(`${baseUrl}/`);
  await visible(page, 'upload-family').click();
  await page.waitForURL(`${baseUrl}/materials/upload`);
  await waitForVisibleText(page, 'Upload a measured table');
}

/** Clicks the picker button and answers the browser's file chooser. */
async function chooseFile(page: Page, name: string, contents: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: /^Choose (CSV file|another file)$/ }).filter({ visible: true }).click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(contents, 'utf8') });
}

describe('uploading a measured family in a real browser', () => {
  let session: BrowserSession;
  const familyName = `Ingot E2E-${Date.now().toString(36)} measured table`;

  beforeAll(async () => {
    session = await openBrowser();
    // A physicist may create families (README, "Demo accounts").
    await signInAs(session, 'piet@northlight.example');
  });

  afterAll(async () => {
    // Against a long-lived stack, keep the active list tidy: archive (never delete) what this test made.
    if (session) {
      const listed = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
      for (const f of listed.families.filter((family) => family.name === familyName)) {
        await session.context.request.post(`${baseUrl}/api/families/${f.id}/archive`, { headers: { Origin: baseUrl } });
      }
    }
    await session?.close();
  });

  it('uploads a CSV, shows the preview and a plot, saves, and lists the family (desktop)', async () => {
    const page = await session.newPage('desktop');
    await openUpload(page);
    await saveScreenshot(page, 'upload-start-desktop');
    await chooseFile(page, 'ingot-e2e.csv', measuredCsv());

    await waitForVisibleText(page, 'Ready to save');
    const status = visible(page, 'preview-status');
    await expect(status.innerText()).resolves.toMatch(/15 rows on 5 dopings × 3 temperatures · p-type/);
    await expect(visible(page, 'coverage-grid').innerText()).resolves.toMatch(/15 measured, 0 missing/);
    await expect(visible(page, 'upload-columns').innerText()).resolves.toMatch(/seebeck_uV_per_K[\s\S]*µV\/K/);
    const warm = await waitForDrawnChart(page, visible(page, 'plot-seebeck'), 150);
    expect(warm).toBeGreaterThanOrEqual(150);
    await saveScreenshot(page, 'upload-preview-desktop');

    await visible(page, 'field-name').fill(familyName);
    await visible(page, 'field-source').fill('Hall and Seebeck on 15 bars, invented for the browser test');
    await visible(page, 'field-summary').fill('Five dopings at 250, 300 and 350 K.');
    await saveScreenshot(page, 'upload-ready-desktop');
    await page.getByRole('button', { name: 'Save measured family' }).filter({ visible: true }).click();

    await page.waitForURL(/\/materials\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    await page.getByRole('heading', { name: familyName }).filter({ visible: true }).waitFor();
    await waitForVisibleText(page, '15 (5 dopings × 3 temperatures)');
    await saveScreenshot(page, 'family-detail-desktop');

    await page.getByRole('link', { name: 'Back to Materials' }).filter({ visible: true }).click();
    await page.waitForURL(`${baseUrl}/materials`);
    await waitForVisibleText(page, familyName);
    await saveScreenshot(page, 'materials-after-upload-desktop');

    const listed = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
    const saved = listed.families.find((f) => f.name === familyName);
    expect(saved).toMatchObject({ kind: 'table', carrier: 'p', version: 1, archived: false });
    await page.close();
  });

  it('names the line and column of a broken cell and keeps Save disabled (phone)', async () => {
    const page = await session.newPage('phone');
    await openUpload(page);
    await chooseFile(page, 'ingot-e2e.csv', measuredCsv());
    await waitForVisibleText(page, 'Ready to save');
    await waitForDrawnChart(page, visible(page, 'plot-seebeck'), 150);
    await saveScreenshot(page, 'upload-preview-phone');

    await chooseFile(page, 'ingot-e2e-broken.csv', brokenCsv());
    await waitForVisibleText(page, 'This file cannot be saved');
    const errors = visible(page, 'upload-errors');
    await errors.scrollIntoViewIfNeeded();
    await expect(errors.innerText()).resolves.toMatch(/Line 4, column seebeck_uV_per_K/);
    await expect(errors.innerText()).resolves.toMatch(/21O\.5/);
    await saveScreenshot(page, 'upload-error-phone');
    const save = page.getByRole('button', { name: 'Save measured family' }).filter({ visible: true });
    await expect(save.getAttribute('aria-disabled')).resolves.toBe('true');
    await page.close();
  });

  it.each(['desktop', 'phone'] as const)('describes a grid too large to draw, and shows a file over a cap refused by name (%s)', async (viewport) => {
    const page = await session.newPage(viewport);
    await openUpload(page);
    // 200 rows, every doping and temperature different: under the caps, a 200 × 200 grid with 39,800 holes.
    await chooseFile(page, 'sparse-200.csv', sparseGridCsv(200));
    await waitForVisibleText(page, 'This file cannot be saved');
    const grid = visible(page, 'coverage-grid');
    await grid.scrollIntoViewIfNeeded();
    await expect(grid.innerText()).resolves.toMatch(/200 dopings × 200 temperatures: 200 measured, 39800 missing\.[\s\S]*40000 grid points are too many to draw here\./);
    await expect(visible(page, 'coverage-holes').innerText()).resolves.toMatch(/^First missing: .* at 201\.5 K; .*; and 39795 more\.$/);
    await saveScreenshot(page, `upload-sparse-grid-${viewport}`);

    // 2,000 such rows: refused whole, naming the cap and the count.
    await chooseFile(page, 'sparse-2000.csv', sparseGridCsv(2000));
    await waitForVisibleText(page, 'File refused');
    await waitForVisibleText(page, 'The file has 2000 different carrier concentrations; a table holds at most 200 (a measurement campaign has tens)');
    await expect(page.getByTestId('upload-preview').filter({ visible: true }).count()).resolves.toBe(0);
    await saveScreenshot(page, `upload-refused-${viewport}`);
    await page.close();
  });

  it('shows the saved family at phone width', async () => {
    const listed = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
    const saved = listed.families.find((f) => f.name === familyName);
    expect(saved).toBeDefined();
    const page = await session.newPage('phone');
    await page.goto(`${baseUrl}/materials/${saved!.id}`);
    await page.getByRole('heading', { name: familyName }).filter({ visible: true }).waitFor();
    await saveScreenshot(page, 'family-detail-phone');
    await waitForDrawnChart(page, visible(page, 'plot-zT'), 50);
    await saveScreenshot(page, 'family-plots-phone');
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(session)).toEqual([]);
  });
});
