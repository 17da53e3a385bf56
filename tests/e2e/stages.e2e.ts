import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { coolerResponseSchema, coolersResponseSchema } from '../../shared/api/coolers';
import { runsResponseSchema } from '../../shared/api/runs';
import { baseUrl, eventually, getJsonAs, openBrowser, pageProblems, postJsonAs, saveScreenshot, signInAs, visible, type BrowserSession } from './browser';

jest.setTimeout(900_000);

/** The seeded demo cascade ("Demo: detector cascade, …") or matched couple ("Demo: matched couple, …"), by name: other files save their own. */
async function demoCooler(session: BrowserSession, kind: 'cascade' | 'couple') {
  const { coolers } = coolersResponseSchema.parse(await getJsonAs(session, '/api/coolers'));
  const name = kind === 'cascade' ? /^Demo: detector cascade/ : /^Demo: matched couple/;
  const found = coolers.find((c) => c.kind === kind && name.test(c.name));
  if (!found) throw new Error(`the demo lab has no ${kind}`);
  return found;
}

/** A run launched through the API and waited for until it has a result. */
async function finishedRun(session: BrowserSession, coolerId: string, seconds: number): Promise<string> {
  const { run } = (await postJsonAs(session, `/api/coolers/${coolerId}/runs`, {})) as { run: { id: string } };
  await eventually(async () => {
    const { runs } = runsResponseSchema.parse(await getJsonAs(session, `/api/runs?coolerId=${coolerId}`));
    const r = runs.find((x) => x.id === run.id);
    if (r?.state === 'failed' || r?.state === 'cancelled') throw new Error(`the run ended ${r.state}: ${r.error ?? ''}`);
    return r?.state === 'succeeded' ? true : undefined;
  }, seconds, 'the couple run to finish');
  return run.id;
}

const noSideways = async (page: Page) => expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);

describe('Stages: the demo cascade launched, watched and read; a new 2-stage cascade built from its pieces; a viewer reads only', () => {
  let piet: BrowserSession;
  let vic: BrowserSession;

  beforeAll(async () => {
    piet = await openBrowser();
    vic = await openBrowser();
    await signInAs(piet, 'piet@northlight.example');
    await signInAs(vic, 'vic@northlight.example');
  });

  afterAll(async () => {
    expect(pageProblems(piet, vic)).toEqual([]);
    await piet.close();
    await vic.close();
  });

  it('opens the demo cascade from Runs on a phone, launches it, watches it and reads the pyramid, the stage table and the CSV', async () => {
    const cascade = await demoCooler(piet, 'cascade');
    const page = await piet.newPage('phone');
    await page.goto(`${baseUrl}/runs`);
    await visible(page.getByTestId('stages-link')).click();
    await visible(page.getByTestId(`cooler-row-${cascade.id}`)).waitFor({ timeout: 60_000 });
    await noSideways(page);
    await saveScreenshot(page, 'stages-list-390');
    await visible(page.getByTestId(`cooler-row-${cascade.id}`)).click();
    await page.waitForURL(`**/stages/${cascade.id}`);
    await visible(page.getByRole('button', { name: 'Launch run' })).click();
    // Progress of the run just launched, then its result on the same page.
    await visible(page.getByTestId('run-progress')).waitFor({ timeout: 60_000 });
    await visible(page.getByTestId('cooler-latest').getByTestId('pyramid')).waitFor({ timeout: 600_000 });
    const table = visible(page.getByTestId('stage-table'));
    await expect(table.textContent()).resolves.toMatch(/Cold side.*K.*Hot side.*K.*Current.*A.*Voltage.*V.*Power.*W/);
    const bars = await page.getByTestId('cooler-latest').locator('[data-testid^="pyramid-bar-"]').evaluateAll((els) => els.map((e) => e.getBoundingClientRect().width));
    expect(bars.length).toBeGreaterThanOrEqual(2);
    // Coldest on top and narrowest or equal: a cascade's lower stages carry the heat of those above.
    expect(bars[0]).toBeLessThanOrEqual(bars[bars.length - 1]! + 0.5);
    await noSideways(page);
    await saveScreenshot(page, 'stages-cascade-390');
    // The heat-load curves, on their log axis, to look at.
    await visible(page.getByTestId('cooler-latest').getByTestId('cascade-curves')).scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'stages-cascade-curves-390');
    const downloading = page.waitForEvent('download', { timeout: 60_000 });
    await visible(page.getByText('Export cascade CSV')).click();
    const csv = readFileSync((await (await downloading).path())!, 'utf8');
    expect(csv.split('\n').find((l) => l.includes('cold_side_K'))).toMatch(/couples.*cold_side_K.*hot_side_K.*current_A.*power_W/);
    await page.close();
  });

  it('builds a 2-stage cascade on a desktop from the demo cascade and a finished matched-couple run', async () => {
    const cascade = await demoCooler(piet, 'cascade');
    const couple = await demoCooler(piet, 'couple');
    const coupleRun = await finishedRun(piet, couple.id, 600);
    const page = await piet.newPage('desktop');
    await page.goto(`${baseUrl}/stages/new-cascade?from=${cascade.id}`);
    await visible(page.getByTestId('field-cascade-name')).fill(`Two-stage from the demo ${Date.now().toString(36)}`);
    while ((await page.getByTestId(/^stage-\d$/).count()) > 2) await visible(page.getByRole('button', { name: 'Remove stage' })).click();
    await visible(page.getByTestId('stage-1-source-couple')).click();
    await visible(page.getByTestId(`stage-1-couple-run-${coupleRun}`)).click();
    await visible(page.getByRole('button', { name: 'Save', exact: true })).click();
    await page.waitForURL(/\/stages\/[0-9a-f-]{36}$/, { timeout: 60_000 });
    const id = page.url().split('/').pop()!;
    const { cooler } = coolerResponseSchema.parse(await getJsonAs(piet, `/api/coolers/${id}`));
    expect(cooler.input.kind === 'cascade' && cooler.input.stages.map((s) => s.source.kind)).toEqual(['couple', expect.any(String)]);
    // The saved cascade's own page, drawn before it is photographed.
    await visible(page.getByTestId('cooler-facts')).waitFor({ timeout: 60_000 });
    await saveScreenshot(page, 'stages-new-cascade-1280');
    await page.close();
  });

  it('shows a viewer the cascade and its runs without a launch, edit or new button', async () => {
    const cascade = await demoCooler(vic, 'cascade');
    const page = await vic.newPage('desktop');
    await page.goto(`${baseUrl}/stages`);
    await visible(page.getByTestId(`cooler-row-${cascade.id}`)).waitFor({ timeout: 60_000 });
    expect(await page.getByTestId('new-cascade').count()).toBe(0);
    await visible(page.getByTestId('write-guard')).waitFor();
    await page.goto(`${baseUrl}/stages/${cascade.id}`);
    await visible(page.getByTestId('cooler-facts')).waitFor({ timeout: 60_000 });
    expect(await page.getByRole('button', { name: 'Launch run' }).count()).toBe(0);
    expect(await page.getByTestId('edit-cooler').count()).toBe(0);
    await saveScreenshot(page, 'stages-viewer-1280');
    await page.close();
  });
});
