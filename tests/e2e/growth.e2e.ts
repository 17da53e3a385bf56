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
import { baseUrl, convergedRun, getJsonAs, openBrowser, pageProblems, saveScreenshot, screenshotDir, signInAs, visible, waitForDrawnChart, waitForMail, type BrowserSession } from './browser';

jest.setTimeout(420_000);

/** The zone grown off target on purpose, and by how much (3× the target doping: far above its band). */
const offZone = 1;
const offFactor = 3;
/**
 * A zone on target on average with one stray position three quarters along it:
 * S a few per cent above the band's top and σ below its bottom, in the
 * proportions of a real upload (312 against 246–304 µV/K, 292 against 306–603 S/cm).
 */
const strayZone = 2;

/** Where the stray position lies (mm), and its line in the file (the last row). */
function strayPoint(sheet: GrowthSheet, zones: number): { mm: number; seebeck: number; sigma: number } {
  const zone = sheet.steps.find((s) => s.zones === zones)!.rows[strayZone]!;
  return { mm: Number((zone.startMm + 0.75 * (zone.endMm - zone.startMm)).toFixed(3)), seebeck: zone.seebeckBandUvK[1] * (312 / 304), sigma: zone.sigmaBandSCm[0] * (292 / 306) };
}

/**
 * Room-temperature S (µV/K) and σ (S/cm) every 0.1 mm along the leg, from
 * the family at each zone's target doping, with one zone grown `offFactor`
 * times too heavily doped, and the stray position as the file's last row.
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
  const stray = strayPoint(sheet, zones);
  lines.push(`${stray.mm},${stray.seebeck.toFixed(2)},${stray.sigma.toFixed(3)}`);
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

    // On paper the zone diagram keeps its doping shading, as its caption says, printed exactly.
    await page.emulateMedia({ media: 'print' });
    const fills = await page.getByTestId('zone-diagram').locator('[data-testid^="zone-box-"]').evaluateAll((boxes) =>
      boxes.map((b) => { const st = getComputedStyle(b); return { fill: st.backgroundColor, exact: st.getPropertyValue('print-color-adjust') }; }));
    expect(fills).toHaveLength(rows.length);
    for (const f of fills) expect(f).toEqual({ fill: expect.stringMatching(/^rgb\(/), exact: 'exact' });
    // Higher target doping, darker shade (the ramp reads in black and white too).
    const grey = (rgb: string) => { const [r, g, b] = rgb.match(/\d+/g)!.map(Number); return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!; };
    const byDoping = rows.map((r, i) => ({ n: r.perCm3, grey: grey(fills[i]!.fill) })).sort((a, b) => a.n - b.n);
    for (let i = 1; i < byDoping.length; i += 1) expect(byDoping[i]!.grey).toBeLessThanOrEqual(byDoping[i - 1]!.grey);
    expect(await visible(page.getByTestId('zone-diagram')).innerText()).toMatch(/Shading follows the target doping/);
    await visible(page.getByTestId('zone-diagram')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-sheet-print-media-desktop');
    // Back to no emulation: page.pdf() then prints with the print media again.
    await page.emulateMedia({ media: null });
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

    // Grown, nothing uploaded: "Mark as measured" is there but disabled, and says why, at both widths.
    for (const size of ['phone', 'desktop'] as const) {
      const p = size === 'desktop' ? page : await grower.newPage('phone');
      if (size === 'phone') await p.goto(`${baseUrl}/growth/${orderId}`);
      const mark = visible(p.getByRole('button', { name: 'Mark as measured' }));
      await mark.waitFor({ timeout: 30_000 });
      expect(await mark.isDisabled()).toBe(true);
      expect(await visible(p.getByTestId('advance-blocker')).innerText()).toMatch(/No measurements yet[\s\S]*opens once the as-grown measurements are uploaded/);
      await visible(p.getByTestId('advance-order')).scrollIntoViewIfNeeded();
      await saveScreenshot(p, `growth-measured-disabled-${size}`);
      if (size === 'phone') await p.close();
    }
    // The API refuses the same step, naming what is missing.
    const early = await grower.context.request.put(`${baseUrl}/api/growth-orders/${orderId}/state`, { data: { state: 'measured' }, headers: { Origin: baseUrl } });
    expect(early.status()).toBe(409);
    expect(((await early.json()) as { errors: Array<{ field: string }> }).errors[0]!.field).toBe('measurements');

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
    expect(await visible(page.getByRole('button', { name: 'Mark as measured' })).isDisabled()).toBe(false);
    await visible(page.getByRole('button', { name: 'Mark as measured' })).click();
    await visible(page.getByTestId('order-state')).filter({ hasText: 'Measured' }).waitFor({ timeout: 20_000 });
    await visible(page.getByTestId('measurement-report')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-report-grower-desktop');
    await page.close();
  });

  it('the physicist sees the predicted ΔT of the as-grown leg and the flagged zone', async () => {
    const detail = await orderDetail(physicist, orderId);
    const report = detail.measurements[0]!.report as unknown as MeasurementReport;
    expect(report.verdicts.map((v) => v.verdict)).toEqual(report.verdicts.map((v) => (v.zone === offZone ? 'high' : v.zone === strayZone ? 'stray' : 'within')));
    const stray = strayPoint(detail.sheet as unknown as GrowthSheet, detail.order.zones);
    const flagged = report.points.filter((q) => q.readings.some((r) => r.verdict !== 'within'));
    // Every position of the off zone, and the stray one — no other.
    expect(flagged.filter((q) => q.zone !== offZone).map((q) => q.positionMm)).toEqual([stray.mm]);
    const strayLine = flagged.find((q) => q.zone === strayZone)!.line;
    expect(report.verdicts[strayZone]).toMatchObject({ readingsOutside: 2 });
    expect(report.asGrown.atDesignCurrent.deltaT).toBeLessThan(report.target.deltaT);
    for (const size of ['desktop', 'phone'] as const) {
      const page = await physicist.newPage(size);
      await page.goto(`${baseUrl}/growth/${orderId}`);
      const predicted = visible(page.getByTestId('report-design-current'));
      await predicted.waitFor({ timeout: 60_000 });
      expect(await predicted.innerText()).toContain(`${Number(report.asGrown.atDesignCurrent.deltaT.toPrecision(3))}\u202fK`);
      expect(await visible(page.getByTestId('report-target')).innerText()).toContain(`${Number(report.target.deltaT.toPrecision(3))}\u202fK`);
      expect(await visible(page.getByTestId('report-summary')).innerText()).toMatch(new RegExp(`zone ${offZone + 1} above band, zone ${strayZone + 1} readings outside band`));
      await visible(page.getByTestId('measurement-report')).scrollIntoViewIfNeeded();
      await saveScreenshot(page, `growth-report-${size}`);
      // The stray zone does not read "Within band", and says how many readings are out.
      const zoneCard = visible(page.getByTestId(`verdict-${strayZone + 1}`));
      expect(await zoneCard.innerText()).toMatch(new RegExp(`Readings outside band[\\s\\S]*2 of ${report.verdicts[strayZone]!.readings} readings outside its band`));
      expect(await zoneCard.innerText()).not.toMatch(/Within band/);
      // The stray position's row: each reading, its band, and the verdict in words.
      const row = visible(page.getByTestId(`reading-row-${strayLine}`));
      await row.scrollIntoViewIfNeeded();
      const rowText = await row.innerText();
      expect(rowText).toMatch(/Outside band: S above, σ below/);
      expect(rowText).toMatch(/above band [\d.]+–[\d.]+\sµV\/K[\s\S]*below band [\d.]+–[\d.]+\sS\/cm/);
      await saveScreenshot(page, `growth-report-readings-${size}`);
      if (size === 'desktop') {
        // The report's CSV link carries the same verdict per position.
        const href = await visible(page.getByTestId('report-csv')).getAttribute('href');
        const csv = await (await physicist.context.request.get(new URL(href!, baseUrl).toString())).text();
        const strayRow = csv.split('\n').find((l) => l.startsWith(`${strayLine},`))!;
        expect(strayRow).toMatch(/above band,.*below band,.*outside band \(2 of 2 readings\)$/);
      }
      const plot = visible(page.getByTestId('report-plot'));
      await plot.scrollIntoViewIfNeeded();
      // The as-grown series is drawn in the warm colour; positions with a reading out of band have a marker and a legend entry of their own.
      expect(await waitForDrawnChart(page, plot, 40)).toBeGreaterThanOrEqual(40);
      expect(await plot.innerText()).toMatch(/Reading outside its band/);
      expect(await plot.locator('[role="img"]').first().getAttribute('aria-label')).toContain(`${report.points.length} measured positions, ${flagged.length} of them with a reading outside its band`);
      await saveScreenshot(page, `growth-report-plot-${size}`);
      await page.close();
    }
  });

  it('closing has no verdict chosen, at phone and desktop widths', async () => {
    for (const size of ['phone', 'desktop'] as const) {
      const page = await physicist.newPage(size);
      await page.goto(`${baseUrl}/growth/${orderId}`);
      const close = visible(page.getByTestId('close-order'));
      await close.waitFor({ timeout: 30_000 });
      for (const id of ['verdict-approved', 'verdict-rejected']) expect(await visible(page.getByTestId(id)).getAttribute('aria-checked')).toBe('false');
      expect(await page.getByRole('button', { name: /^Close as/ }).count()).toBe(0);
      expect(await visible(page.getByRole('button', { name: 'Close the order' })).isDisabled()).toBe(true);
      expect(await close.innerText()).toMatch(/Choose Approve or Reject first/);
      await close.scrollIntoViewIfNeeded();
      await saveScreenshot(page, `growth-close-unchosen-${size}`);
      await page.close();
    }
  });

  it('the physicist rejects the piece with a reason, which closes the order and mails the grower', async () => {
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/growth/${orderId}`);
    const close = visible(page.getByTestId('close-order'));
    await close.waitFor({ timeout: 30_000 });
    await visible(page.getByTestId('verdict-rejected')).click();
    const reason = `Zone ${offZone + 1} over-doped; regrow with less dopant.`;
    await visible(page.getByTestId('field-close-reason')).fill(reason);
    await visible(page.getByRole('button', { name: 'Close as rejected' })).click();
    const confirm = visible(page.getByTestId('close-confirm'));
    expect(await confirm.innerText()).toMatch(/Close the order as rejected\?[\s\S]*closes for good[\s\S]*e-mailed/);
    await close.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-close-confirm-desktop');
    await visible(page.getByRole('button', { name: 'Yes, close as rejected' })).click();
    await visible(page.getByTestId('order-state')).filter({ hasText: 'Rejected' }).waitFor({ timeout: 20_000 });
    expect(await visible(page.getByTestId('close-reason')).innerText()).toMatch(/over-doped; regrow/);
    expect(await page.getByRole('button', { name: /Mark as|Accept the order|Start growing/ }).count()).toBe(0);
    const detail = await orderDetail(physicist, orderId);
    expect(detail.timeline.map((e) => e.toState ?? e.kind)).toEqual(['requested', 'sheet', 'accepted', 'growing', 'grown', 'measured', 'measured', 'rejected']);
    await visible(page.getByTestId('order-timeline')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'growth-closed-desktop');
    await page.close();

    // The grower is e-mailed the verdict and the reason; the admin's outbox shows it, at both widths.
    const admin = await openBrowser();
    try {
      await signInAs(admin, 'ada@northlight.example');
      const mail = await waitForMail(admin, 'greta@northlight.example', new RegExp(`^Growth order ${batch} rejected$`), 30_000);
      expect(mail.text).toContain(`Reason: ${reason}`);
      expect(mail.text).toContain(`/growth/${orderId}`);
      for (const size of ['phone', 'desktop'] as const) {
        const outbox = await admin.newPage(size);
        await outbox.goto(`${baseUrl}/outbox`);
        await visible(outbox.getByText(`Growth order ${batch} rejected`)).waitFor({ timeout: 30_000 });
        await saveScreenshot(outbox, `growth-verdict-mail-${size}`);
        await outbox.close();
      }
      expect(pageProblems(admin)).toEqual([]);
    } finally {
      await admin.close();
    }
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(physicist, grower)).toEqual([]);
  });
});
