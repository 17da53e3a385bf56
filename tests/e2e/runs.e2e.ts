import type { Locator, Page } from 'playwright-core';
import { outboxResponseSchema, type OutboxMessage } from '../../shared/api/outbox';
import { runDetailSchema } from '../../shared/api/runs';
import {
  baseUrl,
  eventually,
  getJsonAs,
  openBrowser,
  pageProblems,
  postJsonAs,
  saveScreenshot,
  signInAs,
  visible,
  waitForDrawnChart,
  waitForVisibleText,
  type BrowserSession,
  type ViewportName,
} from './browser';

// A loaded 2-core machine can take minutes for a 600-start run; a quiet one takes tens of seconds.
jest.setTimeout(900_000);

/** The demo p-type family (README, "Demo lab"). */
const familyRadio = /^NL-P7 .*p-type band model \(p\)$/;
/** Enough starts that the run lasts several seconds (each is a full local optimisation, ~25 ms on a quiet machine). */
const starts = 600;

/** Waits until a chart card's canvas shows the optimum's line, glacier blue (or its error boundary speaks). */
const waitForDrawnLine = (page: Page, card: Locator, minPixels = 60, timeout = 60_000) => waitForDrawnChart(page, card, minPixels, timeout, 'glacier');

async function progressValue(page: Page): Promise<number> {
  return Number(await visible(page.getByTestId('run-progress')).getAttribute('aria-valuenow'));
}

async function fillDesign(page: Page, name: string): Promise<void> {
  await page.goto(`${baseUrl}/designs`);
  await visible(page.getByText('New design', { exact: true })).click();
  await page.waitForURL(`${baseUrl}/designs/new`);
  await visible(page.getByTestId('field-name')).fill(name);
  await visible(page.getByRole('radio', { name: familyRadio })).click();
  await visible(page.getByTestId('field-lengthMm')).fill('1.5');
  await visible(page.getByTestId('field-controlPoints')).fill('6');
  await visible(page.getByTestId('field-starts')).fill(String(starts));
}

describe('a physicist optimises a leg in a real browser', () => {
  let physicist: BrowserSession;
  let admin: BrowserSession;
  const designName = `Browser leg ${Date.now()}`;
  let runId = '';

  beforeAll(async () => {
    physicist = await openBrowser();
    admin = await openBrowser();
    await signInAs(physicist, 'piet@northlight.example');
    await signInAs(admin, 'ada@northlight.example');
  });

  afterAll(async () => {
    await physicist?.close();
    await admin?.close();
  });

  it('creates a design with a quick estimate, launches it and watches the progress bar move', async () => {
    const page = await physicist.newPage('desktop');
    await fillDesign(page, designName);
    // Real contacts (5 µΩ·cm² at each end) and a 2 mW parasitic load: the run page must say it computed with them.
    await visible(page.getByTestId('field-coldContactMicroOhmCm2')).fill('5');
    await visible(page.getByTestId('field-hotContactMicroOhmCm2')).fill('5');
    await visible(page.getByTestId('parasitic-fixed')).click();
    await visible(page.getByTestId('field-parasiticLoadW')).fill('0.002');
    await page.getByTestId('field-parasiticLoadW').scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'design-form-contacts-desktop');
    const estimate = visible(page.getByTestId('quick-estimate'));
    await estimate.getByRole('button', { name: 'Quick estimate' }).click();
    const uniform = visible(page.getByTestId('estimate-uniform'));
    await uniform.waitFor({ timeout: 30_000 });
    expect(await uniform.innerText()).toMatch(/^ΔT ≈ \d+(\.\d+)?\sK at \d+(\.\d+)?\sA$/);
    await estimate.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'design-form-estimate-desktop');

    await visible(page.getByRole('button', { name: 'Save design' })).click();
    await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
    await waitForVisibleText(page, designName);
    await saveScreenshot(page, 'design-page-desktop');

    await visible(page.getByRole('button', { name: 'Launch run' })).click();
    await page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
    runId = /\/runs\/([0-9a-f-]{36})$/.exec(page.url())![1];

    // Two readings of the bar, the second strictly later in the run: the bar moves live.
    const first = await eventually(async () => {
      const v = await progressValue(page);
      return v > 0 && v < 100 ? v : undefined;
    }, 120, 'the first progress report');
    await saveScreenshot(page, 'run-live-desktop');
    const second = await eventually(async () => {
      const state = await visible(page.getByTestId('run-state')).innerText();
      if (/Succeeded/.test(state)) throw new Error(`the run finished before the bar was seen to move past ${first} %`);
      const v = await progressValue(page);
      return v > first ? v : undefined;
    }, 120, 'the bar to move');
    expect(second).toBeGreaterThan(first);
    await waitForDrawnLine(page, visible(page.getByTestId('live-doping')));
    await saveScreenshot(page, 'run-live-chart-desktop');
    await page.close();
  });

  it.each<ViewportName>(['phone', 'desktop'])('a run waiting for the worker shows its place in line and why, at %s width', async (size) => {
    // The stack has one worker: a long run holds it, so a second launch waits behind it.
    const { design } = runDetailSchema.parse(await getJsonAs(physicist, `/api/runs/${runId}`));
    const { familyId, lengthMm, areaMm2, hotSide, minPerCm3, maxPerCm3, controlPoints } = design;
    const long = (await postJsonAs(physicist, '/api/designs', { name: `${designName} blocker ${size}`, familyId, lengthMm, areaMm2, hotSide, minPerCm3, maxPerCm3, controlPoints, starts: 5000 })) as { design: { id: string } };
    const launch = async () => ((await postJsonAs(physicist, `/api/designs/${long.design.id}/runs`, {})) as { run: { id: string } }).run.id;
    const blocker = await launch();
    const waiting = await launch();
    const page = await physicist.newPage(size);
    try {
      await page.goto(`${baseUrl}/runs/${waiting}`);
      expect(await visible(page.getByTestId('run-state')).innerText()).toMatch(/Queued/);
      await visible(page.getByText(/^Queued since .* · (next|number \d+) in line$/)).waitFor();
      expect(await visible(page.getByTestId('run-waiting')).innerText()).toMatch(/next in line for a free worker|\d+ runs? ahead of it in the queue/);
      await saveScreenshot(page, `run-waiting-${size}`);
    } finally {
      // Never leave a 5000-start run holding the stack's one worker for the tests that follow.
      for (const id of [waiting, blocker]) await postJsonAs(physicist, `/api/runs/${id}/cancel`, {}).catch(() => undefined);
    }
    await visible(page.getByTestId('run-state')).filter({ hasText: 'Cancelled' }).waitFor({ timeout: 30_000 });
    await page.close();
  });

  it('opens the result with its numbers and plots drawn', async () => {
    const page = await physicist.newPage('desktop');
    await page.goto(`${baseUrl}/runs/${runId}`);
    await visible(page.getByTestId('run-state')).filter({ hasText: 'Succeeded' }).waitFor({ timeout: 720_000 });
    const headline = visible(page.getByTestId('headline-deltaT'));
    expect(await headline.innerText()).toMatch(/\d+(\.\d+)?\sK/);
    expect(await visible(page.getByTestId('caution')).innerText()).toMatch(/hot side can burn/);
    const detail = runDetailSchema.parse(await getJsonAs(physicist, `/api/runs/${runId}`));
    const stored = detail.result as { deltaT: number; baselines: { uniform: { deltaT: number } } };
    expect(stored.deltaT).toBeGreaterThan(stored.baselines.uniform.deltaT);
    expect(await visible(page.getByTestId('run-fact-search')).innerText()).toContain(`${starts} of ${starts} starts`);
    expect(await visible(page.getByTestId('run-fact-ends')).innerText()).toMatch(/contacts 5\s(µΩ·cm²) \(cold\), 5\s\1 \(hot\); parasitic load 2\smW onto the cold end/);
    await saveScreenshot(page, 'run-result-desktop');
    for (const q of ['doping', 'temperature', 'zT']) {
      expect(await waitForDrawnLine(page, visible(page.getByTestId(`leg-plot-${q}`)))).toBeGreaterThanOrEqual(60);
    }
    await visible(page.getByTestId('leg-plot-doping')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'run-plots-desktop');
    await visible(page.getByTestId('profile-table')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'run-table-desktop');
    await page.close();
  });

  it.each<ViewportName>(['phone', 'desktop'])('lists designs and runs at %s width', async (size) => {
    const page = await physicist.newPage(size);
    await page.goto(`${baseUrl}/designs`);
    await waitForVisibleText(page, designName);
    await saveScreenshot(page, `designs-${size}`);
    await page.goto(`${baseUrl}/runs`);
    await visible(page.getByTestId(`run-row-${runId}`)).waitFor();
    await saveScreenshot(page, `runs-${size}`);
    if (size === 'phone') {
      await page.goto(`${baseUrl}/runs/${runId}`);
      await visible(page.getByTestId('headline-deltaT')).waitFor({ timeout: 60_000 });
      await saveScreenshot(page, 'run-result-phone');
      await waitForDrawnLine(page, visible(page.getByTestId('leg-plot-temperature')));
      await saveScreenshot(page, 'run-plots-phone');
      await page.goto(`${baseUrl}/designs/new`);
      await visible(page.getByTestId('field-name')).waitFor();
      await saveScreenshot(page, 'design-form-phone');
      await visible(page.getByTestId('parasitic-radiation')).click();
      await page.getByTestId('field-surroundingsK').scrollIntoViewIfNeeded();
      await saveScreenshot(page, 'design-form-contacts-phone');
    }
    await page.close();
  });

  it('e-mails the team: the admin finds the run in the outbox', async () => {
    const mail = await eventually(async () => {
      const { messages } = outboxResponseSchema.parse(await getJsonAs(admin, '/api/outbox'));
      return messages.find((m: OutboxMessage) => m.subject.includes(designName));
    }, 60, 'the run e-mail');
    expect(mail.subject).toMatch(/^Run finished: .* ΔT \d+\.\d K$/);
    expect(mail.to).toContain('piet@northlight.example');
    expect(mail.text).toContain(`/runs/${runId}`);
    const page = await admin.newPage('desktop');
    await page.goto(`${baseUrl}/outbox`);
    await waitForVisibleText(page, mail.subject);
    await saveScreenshot(page, 'run-mail-outbox-desktop');
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(physicist, admin)).toEqual([]);
  });
});
