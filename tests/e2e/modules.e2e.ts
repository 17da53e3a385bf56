import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import type { Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import { moduleResponseSchema } from '../../shared/api/modules';
import { runDetailSchema } from '../../shared/api/runs';
import { legsFromRun, parseCurvesCase, parseModuleCase, runCurves, runModule, type RunResultLegs } from '../../shared/engine';
import {
  baseUrl,
  convergedRun,
  demoPFamilyName,
  getJsonAs,
  openBrowser,
  pageProblems,
  saveScreenshot,
  signInAs,
  visible,
  waitForDrawnChart,
  waitForVisibleText,
  type BrowserSession,
} from './browser';

// A one-start run takes tens of seconds on a quiet machine, minutes on a loaded 2-core one.
jest.setTimeout(600_000);

/** The demo n family (README, "Demo lab"); the p leg is the demo p family's run. */
const nFamilyName = /^NL-N3 .*n-type band model$/;
/** The n leg: the demo n family at uniform doping, and the module's couple count. */
const nDoping = '2e19';
const couples = 31;

/** A number as the tables show it (plain, "(over the limit)" may follow); scientific notation is refused, not guessed. */
function shownNumber(text: string): number {
  const m = /^\s*(-?\d+(?:\.\d+)?)(?:\s*\(over the limit\))?\s*$/.exec(text);
  if (!m) throw new Error(`not a plain number as shown in the table: "${text}"`);
  return Number(m[1]);
}

/** Half a unit in the last of `digits` significant digits of `value`: how far a correct display can be from it. */
const halfUlp = (value: number, digits: number) => 0.5 * Math.pow(10, Math.floor(Math.log10(Math.abs(value))) - digits + 1);

/**
 * One marked-current row of a table, each value under its column's head ("Leg", "Marked current", "I", "Qc", …).
 * A phone shows a card per row instead: its title is "device · mark" (or the mark alone) and each line
 * reads "head (unit)" then the value.
 */
async function markedRow(page: Page, table: string, row: string): Promise<Record<string, string>> {
  const line = visible(page.getByTestId(row));
  await line.waitFor({ timeout: 60_000 });
  const heads = (await visible(page.getByTestId(table)).locator('[role="columnheader"]').allInnerTexts()).map((h) => h.split('\n')[0].trim());
  const cells = await line.locator('[role="cell"]').allInnerTexts();
  if (heads.length === 0) {
    const title = (await line.locator('[role="rowheader"]').innerText()).trim().split(' · ');
    const named: Record<string, string> = title.length === 2 ? { Leg: title[0], 'Marked current': title[1] } : { 'Marked current': title[0] };
    return { ...named, ...Object.fromEntries(cells.map((c) => c.trim().split('\n')).map(([head, ...value]) => [head.replace(/ \(.*\)$/, '').trim(), value.join(' ').trim()])) };
  }
  expect(cells).toHaveLength(heads.length);
  return Object.fromEntries(heads.map((h, i) => [h, cells[i].trim()]));
}

describe('a physicist opens a run’s curves, builds a module and exports its CSV in a real browser', () => {
  let physicist: BrowserSession;
  const stamp = Date.now().toString(36).toUpperCase();
  const moduleName = `Detector stage ${stamp}`;
  let runId = '';
  let moduleId = '';
  /** The optimum leg's current of maximum Qc at the curves page's ΔT, computed in Node [A]. */
  let legMaxQcCurrent = 0;
  let nFamilyId = '';

  beforeAll(async () => {
    physicist = await openBrowser();
    await signInAs(physicist, 'piet@northlight.example');
  });

  afterAll(async () => {
    await physicist?.close();
  });

  it('converges a short run of the demo p family through the API', async () => {
    const { families } = familiesResponseSchema.parse(await getJsonAs(physicist, '/api/families'));
    const n = families.find((f) => nFamilyName.test(f.name));
    if (!n) throw new Error('the demo NL-N3 band-model family is missing');
    nFamilyId = n.id;
    runId = await convergedRun(physicist, { name: `Module browser leg ${stamp}`, controlPoints: 4 });
  });

  it('follows "Operating curves" from the run and sees the curves and the two marked currents', async () => {
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/runs/${runId}`);
    await visible(page.getByTestId('run-curves-link')).click({ timeout: 60_000 });
    await page.waitForURL(`${baseUrl}/runs/${runId}/curves`);

    const qc = await markedRow(page, 'marked-currents', 'marked-currents-optimum-qc');
    const cop = await markedRow(page, 'marked-currents', 'marked-currents-optimum-cop');
    expect([qc.Leg, qc['Marked current']]).toEqual(['Graded optimum', 'Maximum Qc']);
    expect([cop.Leg, cop['Marked current']]).toEqual(['Graded optimum', 'Maximum COP']);
    // The column heads carry the units: I in A, Qc in W.
    const heads = await visible(page.getByTestId('marked-currents')).locator('[role="columnheader"]').allInnerTexts();
    expect(heads.map((h) => h.replace(/\s+/g, ' ').trim())).toEqual(expect.arrayContaining(['I A', 'Qc W', 'V V', 'P W']));
    const iQc = shownNumber(qc.I);
    const iCop = shownNumber(cop.I);
    expect(iQc).toBeGreaterThan(0);
    expect(iCop).toBeGreaterThan(0);
    // COP peaks at a lower current than the heat load: the COP optimum lies between the start of
    // pumping and the current of maximum Qc (A. F. Ioffe, Semiconductor Thermoelements and
    // Thermoelectric Cooling, 1957: I_maxQc = S·Tc/R > I_maxCOP = S·ΔT / (R·(√(1+Z·Tm) − 1)) for ΔT > 0).
    expect(iCop).toBeLessThan(iQc);

    // The same leg at the page's ΔT, solved by the engine in Node from the stored case and result.
    const deltaT = Number(await visible(page.getByTestId('field-curve-delta-t')).inputValue());
    expect(deltaT).toBeGreaterThan(0);
    const detail = runDetailSchema.parse(await getJsonAs(physicist, `/api/runs/${runId}`));
    const result = detail.result as { hotSide: number; doping: { x: number[]; perCm3: number[] } };
    const { optimum } = legsFromRun(detail.case, { doping: result.doping, baselines: null } as RunResultLegs);
    const node = runCurves(parseCurvesCase({ ...optimum, hotSide: result.hotSide, deltaT }));
    legMaxQcCurrent = node.maxHeatLoad.current;
    expect(Math.abs(iQc - node.maxHeatLoad.current)).toBeLessThanOrEqual(halfUlp(node.maxHeatLoad.current, 4) * 1.01);
    expect(Math.abs(shownNumber(qc.Qc) - node.maxHeatLoad.heatLoad)).toBeLessThanOrEqual(halfUlp(node.maxHeatLoad.heatLoad, 4) * 1.01);
    expect(Math.abs(iCop - node.maxCop!.current)).toBeLessThanOrEqual(halfUlp(node.maxCop!.current, 4) * 1.01);

    // Every plot is drawn: the local-best-zT leg's line is the warm series colour on each canvas.
    for (const q of ['heatLoad', 'cop', 'voltage', 'power']) {
      expect(await waitForDrawnChart(page, visible(page.getByTestId(`curve-plot-${q}`)), 40)).toBeGreaterThanOrEqual(40);
    }
    // The screen scrolls inside its own scroll view: back to the top by its first control.
    await visible(page.getByTestId('curves-build-module')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-curves-desktop');
    await visible(page.getByTestId('marked-currents')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-curves-table-desktop');
    await visible(page.getByTestId('curve-plot-heatLoad')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-curves-plots-desktop');
    await page.close();
  });

  it('shows the curves page at phone width', async () => {
    const page = await physicist.newPage('phone');
    await page.goto(`${baseUrl}/runs/${runId}/curves`);
    // A card per marked current on a phone: every quantity is there, none cut off at the edge.
    const qc = await markedRow(page, 'marked-currents', 'marked-currents-optimum-qc');
    expect([qc.Leg, qc['Marked current']]).toEqual(['Graded optimum', 'Maximum Qc']);
    for (const head of ['I', 'Qc', 'COP', 'V', 'P']) expect(shownNumber(qc[head])).toBeGreaterThan(0);
    await saveScreenshot(page, 'module-flow-curves-phone');
    await visible(page.getByTestId('marked-currents')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-curves-table-phone');
    expect(await waitForDrawnChart(page, visible(page.getByTestId('curve-plot-heatLoad')), 40)).toBeGreaterThanOrEqual(40);
    await saveScreenshot(page, 'module-flow-curves-plots-phone');
    await page.close();
  });

  it('builds a 31-couple module with this leg and an NL-N3 leg, flagged above a current limit', async () => {
    // A limit at the p leg's own current of maximum Qc: the couple pumps up to well above it, so part of the sweep is over.
    const limit = Number(legMaxQcCurrent.toPrecision(2));
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/runs/${runId}/curves`);
    await visible(page.getByTestId('curves-build-module')).click({ timeout: 60_000 });
    await page.waitForURL(`${baseUrl}/modules/new?p=${runId}`);
    // The p leg comes from the run, prefilled: its chip (design name, ΔT, date) is the one chosen.
    const runChoice = visible(page.getByTestId(`p-run-${runId}`));
    await runChoice.waitFor({ timeout: 60_000 });
    expect(await runChoice.getAttribute('aria-checked')).toBe('true');
    expect(await runChoice.innerText()).toContain(`Module browser leg ${stamp} · ΔT`);
    // The n leg's families are n-type (or carrier-free) only: the demo p family is not offered there.
    await visible(page.getByTestId('n-kind-family')).click();
    const { families } = familiesResponseSchema.parse(await getJsonAs(physicist, '/api/families'));
    const pFamily = families.find((f) => demoPFamilyName.test(f.name))!;
    expect(await page.getByTestId(`n-family-${pFamily.id}`).count()).toBe(0);
    expect(await visible(page.getByTestId('p-leg-optimum')).getAttribute('aria-checked')).toBe('true');
    await visible(page.getByTestId('field-module-name')).fill(moduleName);
    await visible(page.getByTestId(`n-family-${nFamilyId}`)).click();
    await visible(page.getByTestId('field-n-per-cm3')).fill(nDoping);
    await visible(page.getByTestId('field-n-length')).fill('1.5');
    await visible(page.getByTestId('field-n-area')).fill('1');
    await visible(page.getByTestId('field-module-couples')).fill(String(couples));
    await visible(page.getByTestId('field-module-currentLimit')).fill(String(limit));
    await saveScreenshot(page, 'module-flow-new-desktop');
    await visible(page.getByRole('button', { name: 'Save module' })).click();
    await page.waitForURL(/\/modules\/[0-9a-f-]{36}$/, { timeout: 30_000 });
    moduleId = /\/modules\/([0-9a-f-]{36})$/.exec(page.url())![1];
    await waitForVisibleText(page, moduleName);

    // What was saved is what was entered.
    const { module } = moduleResponseSchema.parse(await getJsonAs(physicist, `/api/modules/${moduleId}`));
    expect(module.input).toMatchObject({
      name: moduleName,
      p: { kind: 'run', runId, leg: 'optimum' },
      n: { kind: 'family', familyId: nFamilyId, perCm3: Number(nDoping), lengthMm: 1.5, areaMm2: 1 },
      couples,
      currentLimit: limit,
    });

    const qc = await markedRow(page, 'module-marked', 'module-marked-module-qc');
    const cop = await markedRow(page, 'module-marked', 'module-marked-module-cop');
    expect([qc['Marked current'], cop['Marked current']]).toEqual(['Maximum Qc', 'Maximum COP']);
    const iQc = shownNumber(qc.I);
    const iCop = shownNumber(cop.I);
    // Ioffe (1957), as for the leg: maximum COP at a lower current than maximum Qc.
    expect(iCop).toBeLessThan(iQc);

    const warning = visible(page.getByTestId('module-over-limit'));
    const words = await warning.innerText();
    const flagged = /(\d+) of (\d+) sampled currents are over the ([\d.]+) A limit/.exec(words);
    expect(flagged).not.toBeNull();
    expect(Number(flagged![3])).toBe(limit);
    expect(Number(flagged![1])).toBeGreaterThan(0);
    expect(Number(flagged![1])).toBeLessThan(Number(flagged![2]));

    // Curves drawn: the samples over the limit are the warm markers on the Qc plot.
    expect(await waitForDrawnChart(page, visible(page.getByTestId('module-plot-heatLoad')), 40)).toBeGreaterThanOrEqual(40);

    // N-trade: the same total leg area split into N′ couples. The module's own N is a row, and with the
    // same current density in every leg I·N′ and Qc stay the same (scaling of the 1-D leg model: each
    // leg's heat balance depends on I/A only; Ioffe 1957 treats the leg per unit area).
    const trade = visible(page.getByTestId('trade-table'));
    await trade.scrollIntoViewIfNeeded();
    const rows = await trade.locator('[role="row"]').evaluateAll((els) =>
      els.slice(1).map((el) => Array.from(el.querySelectorAll('[role="cell"]')).map((c) => (c as HTMLElement).innerText)),
    );
    expect(rows.length).toBeGreaterThan(2);
    const own = rows.find((r) => Number(r[0]) === couples);
    expect(own).toBeDefined();
    expect(Math.abs(shownNumber(own![2]) - iQc)).toBeLessThanOrEqual(halfUlp(iQc, 4) * 2.02);
    const iTimesN = rows.map((r) => shownNumber(r[2]) * Number(r[0]));
    const maxQc = rows.map((r) => shownNumber(r[4]));
    for (const v of iTimesN) expect(Math.abs(v / iTimesN[0] - 1)).toBeLessThan(2e-3);
    for (const v of maxQc) expect(Math.abs(v / maxQc[0] - 1)).toBeLessThan(2e-3);

    await visible(page.getByTestId('field-module-name')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-saved-desktop');
    await visible(page.getByTestId('module-marked')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-saved-marked-desktop');
    await visible(page.getByTestId('module-plot-heatLoad')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-saved-plots-desktop');
    // Versus ΔT (each ΔT at its own max-Qc current): the first series' colour is drawn, and ΔTmax is stated.
    expect(await waitForDrawnChart(page, visible(page.getByTestId('module-plot-deltaT')), 40, 60_000, 'glacier')).toBeGreaterThanOrEqual(40);
    expect(await page.getByText(/reaches ΔTmax = [\d.]+\sK at [\d.]+\sA/).count()).toBeGreaterThan(0);
    await saveScreenshot(page, 'module-flow-saved-delta-t-desktop');
    await trade.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-saved-trade-desktop');
    await page.close();
  });

  it('exports the module’s curves as CSV through the Export CSV link', async () => {
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/modules/${moduleId}`);
    const qc = await markedRow(page, 'module-marked', 'module-marked-module-qc');
    const link = visible(page.getByTestId('module-csv'));
    const downloading = page.waitForEvent('download', { timeout: 60_000 });
    await link.click();
    const download = await downloading;
    expect(download.suggestedFilename()).toMatch(/^module-.*\.csv$/);
    const text = readFileSync((await download.path())!, 'utf8');
    await page.close();

    const lines = text.trim().split('\n');
    const comments = lines.filter((l) => l.startsWith('#'));
    expect(comments.join('\n')).toContain(`${couples} couples`);
    const records = parse(lines.filter((l) => !l.startsWith('#')).join('\n'), { columns: true, skip_empty_lines: true }) as Record<string, string>[];
    const header = Object.keys(records[0] ?? {});
    // The header names each column's unit.
    expect(header).toEqual(expect.arrayContaining(['current_A', 'heat_load_W', 'voltage_V', 'power_W', 'cop', 'over_current_limit']));
    expect(records.length).toBeGreaterThan(10);
    const current = records.map((r) => Number(r.current_A));
    const heat = records.map((r) => Number(r.heat_load_W));
    for (let k = 1; k < current.length; k += 1) expect(current[k]).toBeGreaterThan(current[k - 1]);

    // The flag column agrees with the saved limit, row by row.
    const { module } = moduleResponseSchema.parse(await getJsonAs(physicist, `/api/modules/${moduleId}`));
    const limit = module.input.currentLimit!;
    records.forEach((r, k) => expect(r.over_current_limit).toBe(current[k] > limit ? 'yes' : 'no'));
    expect(records.some((r) => r.over_current_limit === 'yes')).toBe(true);

    // The marked maximum in the file is the one the page shows (to the page's 4 digits).
    const mark = /# maximum heat load ([\d.e+-]+) W at ([\d.e+-]+) A/.exec(text);
    expect(mark).not.toBeNull();
    const [fileQc, fileI] = [Number(mark![1]), Number(mark![2])];
    expect(Math.abs(shownNumber(qc.I) - fileI)).toBeLessThanOrEqual(halfUlp(fileI, 4) * 1.01);
    expect(Math.abs(shownNumber(qc.Qc) - fileQc)).toBeLessThanOrEqual(halfUlp(fileQc, 4) * 1.01);
    // And no sampled row pumps more than that maximum.
    expect(Math.max(...heat)).toBeLessThanOrEqual(fileQc * (1 + 1e-5));

    // N couples electrically in series, thermally in parallel (no plates): the same current through each,
    // so the module's Qc is N times one couple's at every current (A. F. Ioffe, 1957, on modules of couples).
    // One couple of the same legs, solved in Node; the file holds 6 significant digits.
    const single = runModule(parseModuleCase({ ...module.case, couples: 1 })).versusCurrent;
    expect(single.currents.length).toBe(records.length);
    const scale = Math.max(...single.heatLoad.map(Math.abs));
    records.forEach((_, k) => {
      expect(Math.abs(current[k] / single.currents[k] - 1)).toBeLessThan(1e-5);
      expect(Math.abs(heat[k] - couples * single.heatLoad[k])).toBeLessThan(1e-5 * couples * scale);
    });
  });

  it('shows the saved module at phone width', async () => {
    const page = await physicist.newPage('phone');
    await page.goto(`${baseUrl}/modules/${moduleId}`);
    const qc = await markedRow(page, 'module-marked', 'module-marked-module-qc');
    expect(qc['Marked current']).toBe('Maximum Qc');
    for (const head of ['Qc', 'COP', 'V', 'P']) expect(shownNumber(qc[head])).toBeGreaterThan(0);
    await visible(page.getByTestId('module-over-limit')).waitFor();
    await saveScreenshot(page, 'module-flow-saved-phone');
    await visible(page.getByTestId('module-marked')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-saved-marked-phone');
    expect(await waitForDrawnChart(page, visible(page.getByTestId('module-plot-heatLoad')), 40)).toBeGreaterThanOrEqual(40);
    await saveScreenshot(page, 'module-flow-saved-plots-phone');
    await visible(page.getByTestId('trade-table')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'module-flow-saved-trade-phone');
    await page.close();
  });

  it('finds the module in the Modules list and compares it with the run it was built from', async () => {
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/runs`);
    await visible(page.getByTestId('modules-link')).click({ timeout: 60_000 });
    await page.waitForURL(`${baseUrl}/modules`);
    const row = visible(page.getByTestId(`module-row-${moduleId}`));
    await row.waitFor({ timeout: 60_000 });
    const rowText = (await row.innerText()).replace(/\s+/g, ' ');
    expect(rowText).toContain(moduleName);
    expect(rowText).toContain(`${couples} couples`);
    expect(rowText).toContain(`Module browser leg ${stamp}, optimum leg of a run`);
    expect(rowText).toMatch(/NL-N3 .* at 2 × 10¹⁹ cm⁻³/);
    await saveScreenshot(page, 'module-flow-list-desktop');

    await visible(page.getByTestId(`compare-module-${moduleId}`)).click();
    await visible(page.getByTestId('module-compare-link')).click();
    await page.waitForURL(new RegExp(`/runs/compare\\?modules=${moduleId}$`));
    // One module alone is not a comparison: add the run it was built from.
    await visible(page.getByTestId(`pick-run-${runId}`)).click({ timeout: 60_000 });
    const modulesTable = visible(page.getByTestId('compare-modules-table'));
    await modulesTable.waitFor({ timeout: 60_000 });
    await visible(page.getByTestId('compare-table')).waitFor();
    expect(page.url()).toContain(`ids=${runId}`);

    // The comparison's module figures are the module page's (same engine, same saved case).
    const cell = async (key: string) => (await visible(page.getByTestId(`compare-modules-table-row-${key}`)).locator('[role="cell"]').first().innerText()).trim();
    expect(await cell('couples')).toBe(String(couples));
    const maxQc = /^([\d.]+)\s?W at ([\d.]+)\s?A$/.exec(await cell('maxQc'));
    expect(maxQc).not.toBeNull();
    const { module } = moduleResponseSchema.parse(await getJsonAs(physicist, `/api/modules/${moduleId}`));
    const curve = runModule(parseModuleCase(module.case)).versusCurrent;
    expect(Math.abs(Number(maxQc![1]) - curve.maxHeatLoad.heatLoad)).toBeLessThanOrEqual(halfUlp(curve.maxHeatLoad.heatLoad, 4) * 1.01);
    expect(Math.abs(Number(maxQc![2]) - curve.maxHeatLoad.current)).toBeLessThanOrEqual(halfUlp(curve.maxHeatLoad.current, 4) * 1.01);
    expect(Number(/^([\d.]+)\sA/.exec(await cell('limit'))?.[1])).toBe(module.input.currentLimit);
    // The module's curve is the comparison's first series: glacier blue.
    expect(await waitForDrawnChart(page, visible(page.getByTestId('compare-module-heat-load')), 40, 60_000, 'glacier')).toBeGreaterThanOrEqual(40);
    await saveScreenshot(page, 'module-flow-compare-desktop');
    await page.close();

    const phone = await physicist.newPage('phone');
    await phone.goto(`${baseUrl}/runs/compare?ids=${runId}&modules=${moduleId}`);
    await visible(phone.getByTestId('compare-modules-table')).waitFor({ timeout: 60_000 });
    await saveScreenshot(phone, 'module-flow-compare-phone');
    await visible(phone.getByTestId('compare-modules-table')).scrollIntoViewIfNeeded();
    await saveScreenshot(phone, 'module-flow-compare-modules-phone');
    await phone.close();
  });

  it('deletes the module from its page after a second, explicit step', async () => {
    const page = await physicist.newPage('phone');
    await page.goto(`${baseUrl}/modules/${moduleId}`);
    await visible(page.getByTestId('module-delete')).click({ timeout: 60_000 });
    await visible(page.getByTestId('confirm-delete-module')).waitFor();
    await saveScreenshot(page, 'module-flow-delete-confirm-phone');
    await visible(page.getByTestId('confirm-delete-module')).getByTestId('confirm').click();
    await page.waitForURL(`${baseUrl}/modules`);
    await visible(page.getByRole('list', { name: 'Modules' })).waitFor({ timeout: 60_000 });
    expect(await page.getByTestId(`module-row-${moduleId}`).count()).toBe(0);
    // The run it was built from is still there.
    expect(runDetailSchema.parse(await getJsonAs(physicist, `/api/runs/${runId}`)).run.state).toBe('succeeded');
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(physicist)).toEqual([]);
  });
});
