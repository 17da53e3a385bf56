import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { growthOrderDetailSchema } from '../../shared/api/growth';
import { runDetailSchema } from '../../shared/api/runs';
import { familyFromMaterial, propertiesAt, type MaterialInput } from '../../shared/engine';
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import type { MeasurementReport } from '../../shared/growth/measurement-report';
import { baseUrl, convergedRun, getJsonAs, openBrowser, pageProblems, saveScreenshot, screenshotDir, signInAs, visible, waitForDrawnChart, type BrowserSession } from './browser';

jest.setTimeout(420_000);

/** The zone grown off target on purpose, and by how much (3× the target doping: far above its band). */
const offZone = 1;
const offFactor = 3;

/** POST JSON with the session's cookie and the app's Origin (writes must carry it). */
/**
 * Room-temperature S (µV/K) and σ (S/cm) every 0.1 mm along the leg, from
 * the family at each zone's target doping, with one zone grown `offFactor`
 * times too heavily doped.
 */
function measurementsCsv(sheet: GrowthSheet, zones: number, material: MaterialInput): string {
  const step = sheet.steps.find((s) => s.zones === zones)!;
  const family = familyFromMaterial(material);
  const lines = ['position_mm,seebeck_uV_per_K,sigma_S_per_cm'];
  for (let mm = 0.05; mm < sheet.lengthMm; mm += 0.1) {
    const k = step.rows.findIndex((r) => mm >= r.startMm && mm < r.endMm);
    const at = propertiesAt(family, step.rows[k]!.perCm3 * (k === offZone ? offFactor : 1), sheet.measureTemperature);
    lines.push(`${mm.toFixed(2)},${(at.seebeck * 1e6).toFixed(2)},${(at.sigma / 100).toFixed(3)}`);
  }
  return `${lines.join('\n')}\n`;
}

/** Clicks the picker button and answers the browser's file chooser. */
async function chooseFile(page: Page, name: string, contents: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await visible(page.getByRole('button', { name: /^Choose (CSV file|another file)$/ })).click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(contents, 'utf8') });
}

/** Pages of a PDF as Chromium writes it: one `/Type /Page` object per page. */
const pageCount = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-zA-Z])/g) ?? []).length;

const hasTool = (tool: string) => ['/usr/bin', '/usr/local/bin', '/bin'].some((d) => existsSync(join(d, tool)));

/** The PDF's text (poppler's pdftotext; the test runner installs poppler-utils). */
function pdfText(pdf: Buffer): string {
  if (!hasTool('pdftotext')) throw new Error('pdftotext is missing: install poppler-utils (npm test does)');
  const dir = mkdtempSync(join(tmpdir(), 'frostgrade-pdf-'));
  try {
    writeFileSync(join(dir, 'sheet.pdf'), pdf);
    execFileSync('pdftotext', ['-layout', join(dir, 'sheet.pdf'), join(dir, 'sheet.txt')]);
    return readFileSync(join(dir, 'sheet.txt'), 'utf8');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** The document title Chromium writes into the PDF's Info (UTF-16BE hex or a literal string). */
function pdfTitle(pdf: Buffer): string {
  const raw = pdf.toString('latin1');
  const hex = /\/Title\s*<FEFF([0-9A-Fa-f]*)>/.exec(raw);
  if (hex) return Buffer.from(hex[1], 'hex').swap16().toString('utf16le');
  return /\/Title\s*\(([^)]*)\)/.exec(raw)?.[1] ?? '';
}

/** The printed page as a PNG beside the screenshots, to look at. */
function pdfToPng(pdf: Buffer, name: string): void {
  const file = join(screenshotDir, `${name}.pdf`);
  writeFileSync(file, pdf);
  execFileSync('pdftoppm', ['-png', '-r', '96', '-singlefile', file, join(screenshotDir, name)]);
}

async function orderDetail(session: BrowserSession, id: string) {
  return growthOrderDetailSchema.parse(await getJsonAs(session, `/api/growth-orders/${id}`));
}

describe('growth hand-off in a real browser: release, print, grow, measure, judge', () => {
  let physicist: BrowserSession;
  let grower: BrowserSession;
  const stamp = Date.now().toString(36).toUpperCase();
  const batch = `NL-E2E-${stamp}`;
  let runId = '';
  let orderId = '';

  beforeAll(async () => {
    physicist = await openBrowser();
    grower = await openBrowser();
    await signInAs(physicist, 'piet@northlight.example');
    await signInAs(grower, 'greta@northlight.example');
  });

  afterAll(async () => {
    await physicist?.close();
    await grower?.close();
  });

  it('the physicist releases a converged run from its page', async () => {
    runId = await convergedRun(physicist, { name: `Growth browser leg ${stamp}`, controlPoints: 6, minZoneMm: 0.2 }, 180);
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/runs/${runId}`);
    const release = visible(page.getByRole('button', { name: 'Release to grower' }));
    await release.waitFor({ timeout: 60_000 });
    await release.click();
    await visible(page.getByTestId('field-release-batch')).fill(batch);
    await visible(page.getByTestId('field-release-dueDate')).fill('2027-04-30');
    await visible(page.getByTestId('field-release-notes')).fill('Browser-test boule; zone 1 against the cold plate.');
    await saveScreenshot(page, 'growth-release-desktop');
    await visible(page.getByTestId('release-form').getByRole('button', { name: 'Release to grower' })).click();
    await page.waitForURL(/\/growth\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    orderId = /\/growth\/([0-9a-f-]{36})$/.exec(page.url())![1];
    const detail = await orderDetail(physicist, orderId);
    expect(detail.order).toMatchObject({ batch, runId, dueDate: '2027-04-30', state: 'requested', zones: 3 });
    await page.close();
  });

  it('the grower finds the order, opens the sheet and prints it on one page', async () => {
    const list = await grower.newPage('phone');
    await list.goto(`${baseUrl}/growth`);
    const card = visible(list.getByTestId(`order-card-${orderId}`));
    await card.waitFor({ timeout: 30_000 });
    expect(await card.innerText()).toMatch(new RegExp(`${batch}[\\s\\S]*Requested[\\s\\S]*due 30 Apr 2027`));
    await saveScreenshot(list, 'growth-orders-phone');
    await card.click();
    await list.waitForURL(`${baseUrl}/growth/${orderId}`);
    await visible(list.getByTestId('growth-sheet')).waitFor({ timeout: 120_000 });
    await saveScreenshot(list, 'growth-order-phone');
    await visible(list.getByTestId('zone-table')).scrollIntoViewIfNeeded();
    await saveScreenshot(list, 'growth-sheet-phone');
    await list.close();

    const page = await grower.newPage('desktop');
    await page.goto(`${baseUrl}/growth/${orderId}`);
    const sheetView = visible(page.getByTestId('growth-sheet'));
    await sheetView.waitFor({ timeout: 60_000 });
    const { sheet } = await orderDetail(grower, orderId);
    const rows = (sheet as unknown as GrowthSheet).steps.find((s) => s.zones === 3)!.rows;
    // Each zone row of the table names its position and target with units.
    for (const r of rows) {
      const text = await visible(page.getByTestId('zone-table').getByTestId(`zone-row-${r.index + 1}`)).innerText();
      expect(text).toMatch(/mm[\s\S]*cm⁻³[\s\S]*µV\/K[\s\S]*S\/cm/);
    }
    await sheetView.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-sheet-desktop');
    // The sheet says what its zones and bands were computed with (this demo design: ideal contacts, none).
    expect(await visible(page.getByTestId('sheet-fact-ends')).innerText()).toMatch(/Computed with\s+ideal contacts \(0\sµΩ·cm²\), no parasitic heat/);

    for (const format of ['A4', 'Letter'] as const) {
      const pdf = await page.pdf({ format });
      expect(pageCount(pdf)).toBe(1);
      const text = pdfText(pdf);
      expect(text).toContain(batch);
      expect(text).toMatch(/Model predictions — verify by measurement/);
      expect(text).toMatch(/cm⁻³[\s\S]*µV\/K[\s\S]*S\/cm/);
      // How the bands hold, and the yield, travel with the sheet.
      expect(text).toMatch(/computed\s+jointly/);
      expect(text).toMatch(/\d+(\.\d)? % of 600 simulated as-grown/);
      // Navigation and buttons stay off paper.
      expect(text).not.toMatch(/Print sheet|Sign out|Accept the order/);
      // The document's title names the batch too (what a print queue shows).
      expect(pdfTitle(pdf)).toContain(`Growth order ${batch} · Growth · Frostgrade`);
      if (format === 'A4') pdfToPng(pdf, 'growth-sheet-print');
    }
    await page.close();
  });

  it('the grower reads the yield (histogram, percentage, scatter) and recomputes it at another scatter, phone and desktop', async () => {
    for (const size of ['phone', 'desktop'] as const) {
      const page = await grower.newPage(size);
      await page.goto(`${baseUrl}/growth/${orderId}`);
      const block = visible(page.getByTestId('yield-block'));
      await block.waitFor({ timeout: 60_000 });
      expect(await visible(page.getByTestId('band-note')).innerText()).toMatch(/computed jointly: every combination inside the bands keeps the loss ≤ 1 K \(corners re-solved: 8, all of them/);
      expect(await block.innerText()).toMatch(/\d+(\.\d)? %[\s\S]*of 600 simulated as-grown legs lose ≤ 1 K at a doping scatter of 0.05 decades/);
      expect(await waitForDrawnChart(page, block, 40, 60_000, 'glacier')).toBeGreaterThanOrEqual(40);
      await saveScreenshot(page, `growth-yield-${size}`);
      await page.close();
    }
    const page = await grower.newPage('desktop');
    await page.goto(`${baseUrl}/growth/${orderId}`);
    const before = await visible(page.getByTestId('yield-percent')).innerText();
    await visible(page.getByTestId('field-doping-scatter')).fill('0.15');
    await visible(page.getByRole('button', { name: 'Recompute yield' })).click();
    await visible(page.getByTestId('yield-note')).filter({ hasText: 'scatter of 0.15 decades' }).waitFor({ timeout: 90_000 });
    const after = await visible(page.getByTestId('yield-percent')).innerText();
    expect(parseFloat(after)).toBeLessThan(parseFloat(before));
    await visible(page.getByTestId('yield-block')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-yield-recomputed-desktop');
    await page.close();
  });

  it('the grower steps the order along and uploads measurements with one zone off', async () => {
    const page = await grower.newPage('desktop');
    await page.goto(`${baseUrl}/growth/${orderId}`);
    const steps: Array<[string, string]> = [['Accept the order', 'Accepted'], ['Start growing', 'Growing'], ['Mark as grown', 'Grown']];
    for (const [button, state] of steps) {
      if (state === 'Growing') await visible(page.getByTestId('field-state-note')).fill('Boule 7, Bridgman run at 2 mm/h.');
      await visible(page.getByRole('button', { name: button })).click();
      await visible(page.getByTestId('order-state')).filter({ hasText: state }).waitFor({ timeout: 20_000 });
    }
    expect(await visible(page.getByTestId('order-timeline')).innerText()).toMatch(/Accepted → Growing[\s\S]*Greta Moreau[\s\S]*Bridgman run/);

    const detail = await orderDetail(grower, orderId);
    const run = runDetailSchema.parse(await getJsonAs(physicist, `/api/runs/${runId}`));
    const csv = measurementsCsv(detail.sheet as unknown as GrowthSheet, detail.order.zones, (run.case as { material: MaterialInput }).material);

    // A broken cell is named by line and column before anything is sent.
    const broken = csv.trim().split('\n');
    broken[2] = broken[2].replace(/,([0-9.]+),/, ',1 8O,');
    await chooseFile(page, 'as-grown-broken.csv', broken.join('\n'));
    const errors = visible(page.getByTestId('upload-errors'));
    await errors.waitFor();
    expect(await errors.innerText()).toMatch(/Line 3, column seebeck_uV_per_K/);
    expect(await page.getByRole('button', { name: 'Upload measurements' }).count()).toBe(0);
    await errors.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-upload-error-desktop');

    await chooseFile(page, 'as-grown.csv', csv);
    await visible(page.getByTestId('measurement-status')).filter({ hasText: 'Ready to upload' }).waitFor();
    await saveScreenshot(page, 'growth-upload-preview-desktop');
    await visible(page.getByRole('button', { name: 'Upload measurements' })).click();
    const verdict = visible(page.getByTestId(`verdict-${offZone + 1}`));
    await verdict.waitFor({ timeout: 60_000 });
    expect(await verdict.innerText()).toMatch(/Above band/);
    await visible(page.getByRole('button', { name: 'Mark as measured' })).click();
    await visible(page.getByTestId('order-state')).filter({ hasText: 'Measured' }).waitFor({ timeout: 20_000 });
    await visible(page.getByTestId('measurement-report')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-report-grower-desktop');
    await page.close();
  });

  it('the physicist sees the predicted ΔT of the as-grown leg and the flagged zone', async () => {
    const detail = await orderDetail(physicist, orderId);
    const report = detail.measurements[0]!.report as unknown as MeasurementReport;
    expect(report.verdicts.map((v) => v.verdict)).toEqual(report.verdicts.map((v) => (v.zone === offZone ? 'high' : 'within')));
    expect(report.asGrown.atDesignCurrent.deltaT).toBeLessThan(report.target.deltaT);
    for (const size of ['desktop', 'phone'] as const) {
      const page = await physicist.newPage(size);
      await page.goto(`${baseUrl}/growth/${orderId}`);
      const predicted = visible(page.getByTestId('report-design-current'));
      await predicted.waitFor({ timeout: 60_000 });
      expect(await predicted.innerText()).toContain(`${Number(report.asGrown.atDesignCurrent.deltaT.toPrecision(3))}\u202fK`);
      expect(await visible(page.getByTestId('report-target')).innerText()).toContain(`${Number(report.target.deltaT.toPrecision(3))}\u202fK`);
      expect(await visible(page.getByTestId('report-summary')).innerText()).toMatch(new RegExp(`zone ${offZone + 1} above band`));
      await visible(page.getByTestId('measurement-report')).scrollIntoViewIfNeeded();
      await saveScreenshot(page, `growth-report-${size}`);
      const plot = visible(page.getByTestId('report-plot'));
      await plot.scrollIntoViewIfNeeded();
      // The as-grown series is drawn in the warm colour.
      expect(await waitForDrawnChart(page, plot, 40)).toBeGreaterThanOrEqual(40);
      await saveScreenshot(page, `growth-report-plot-${size}`);
      await page.close();
    }
  });

  it('the physicist rejects the piece with a reason, which closes the order', async () => {
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/growth/${orderId}`);
    const close = visible(page.getByTestId('close-order'));
    await close.waitFor({ timeout: 30_000 });
    await visible(page.getByTestId('verdict-rejected')).click();
    await visible(page.getByTestId('field-close-reason')).fill(`Zone ${offZone + 1} over-doped; regrow with less dopant.`);
    await visible(page.getByRole('button', { name: 'Close as rejected' })).click();
    await visible(page.getByTestId('order-state')).filter({ hasText: 'Rejected' }).waitFor({ timeout: 20_000 });
    expect(await visible(page.getByTestId('close-reason')).innerText()).toMatch(/over-doped; regrow/);
    expect(await page.getByRole('button', { name: /Mark as|Accept the order|Start growing/ }).count()).toBe(0);
    const detail = await orderDetail(physicist, orderId);
    expect(detail.timeline.map((e) => e.toState ?? e.kind)).toEqual(['requested', 'sheet', 'accepted', 'growing', 'grown', 'measured', 'measured', 'rejected']);
    await visible(page.getByTestId('order-timeline')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-closed-desktop');
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(physicist, grower)).toEqual([]);
  });
});
