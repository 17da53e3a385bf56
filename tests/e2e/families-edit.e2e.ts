import type { Page } from 'playwright-core';
import { familyDetailResponseSchema } from '../../shared/api/families';
import { baseUrl, getJsonAs, openBrowser, pageProblems, saveScreenshot, signInAs, waitForVisibleText, type BrowserSession } from './browser';

jest.setTimeout(240_000);

const visible = (page: Page, testId: string) => page.getByTestId(testId).filter({ visible: true }).first();
const button = (page: Page, name: string) => page.getByRole('button', { name }).filter({ visible: true }).first();

async function fill(page: Page, values: Record<string, string>): Promise<void> {
  for (const [field, text] of Object.entries(values)) await visible(page, `field-${field}`).fill(text);
}

describe('band-model families in a real browser', () => {
  let session: BrowserSession;
  const name = `Band fit E2E-${Date.now().toString(36)}`;
  let familyId = '';

  beforeAll(async () => {
    session = await openBrowser();
    await signInAs(session, 'piet@northlight.example');
  });

  afterAll(async () => {
    await session?.close();
  });

  it('creates a band model through the form, after fixing what the form flags', async () => {
    const page = await session.newPage('phone');
    await page.goto(`${baseUrl}/`);
    await visible(page, 'new-family').click();
    await page.waitForURL(`${baseUrl}/materials/new`);
    await visible(page, 'carrier-n').click();
    await fill(page, { effectiveMass: '0', mobility300: '310', latticeKappa300: '1.25', name, source: 'Fit to Hall and Seebeck, invented for the browser test' });
    await button(page, 'Create family').click();
    await expect(visible(page, 'error-effectiveMass').innerText()).resolves.toMatch(/Effective mass must be greater than 0/);
    await saveScreenshot(page, 'family-form-error-phone');

    await fill(page, { effectiveMass: '1.05' });
    await button(page, 'Create family').click();
    await page.waitForURL(/\/materials\/[0-9a-f-]{36}$/);
    familyId = page.url().split('/').pop() ?? '';
    await page.getByRole('heading', { name }).filter({ visible: true }).waitFor();
    await expect(visible(page, 'param-mobility300').innerText()).resolves.toMatch(/310\s*cm²\/\(V·s\)/);
    await page.close();
  });

  it('edits it into version 2 and keeps version 1 readable', async () => {
    const page = await session.newPage('desktop');
    await page.goto(`${baseUrl}/materials/${familyId}/edit`);
    await expect(visible(page, 'version-notice').innerText()).resolves.toMatch(/Saving creates version 2/);
    await fill(page, { mobility300: '290' });
    await saveScreenshot(page, 'family-edit-desktop');
    await button(page, 'Save changes').click();
    await page.waitForURL(`${baseUrl}/materials/${familyId}`);
    await waitForVisibleText(page, 'VERSION 2 OF 2');
    await expect(visible(page, 'param-mobility300').innerText()).resolves.toMatch(/290\s*cm²\/\(V·s\)/);

    await visible(page, 'version-1').click();
    await page.waitForURL(`${baseUrl}/materials/${familyId}?version=1`);
    await expect(visible(page, 'older-version').innerText()).resolves.toMatch(/Showing version 1 of 2/);
    await expect(visible(page, 'param-mobility300').innerText()).resolves.toMatch(/310\s*cm²\/\(V·s\)/);
    await saveScreenshot(page, 'family-older-version-desktop');

    const detail = familyDetailResponseSchema.parse(await getJsonAs(session, `/api/families/${familyId}`));
    expect(detail.versions.map((v) => v.version).sort()).toEqual([1, 2]);
    await page.close();
  });

  it('exports version 1 as CSV and JSON downloads', async () => {
    const page = await session.newPage('desktop');
    await page.goto(`${baseUrl}/materials/${familyId}?version=1`);
    const csvLink = visible(page, 'export-csv');
    await expect(csvLink.getAttribute('href')).resolves.toBe(`/api/families/${familyId}/export.csv?version=1`);
    const [download] = await Promise.all([page.waitForEvent('download'), visible(page, 'export-json').click()]);
    expect(download.suggestedFilename()).toMatch(/-v1\.json$/);
    const csv = await session.context.request.get(`${baseUrl}/api/families/${familyId}/export.csv?version=1`);
    expect(csv.headers()['content-disposition']).toMatch(/attachment/);
    expect((await csv.text()).split('\n').find((line) => !line.startsWith('#'))).toBe('n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K');
    await page.close();
  });

  it('archives it and finds it under Archived', async () => {
    const page = await session.newPage('desktop');
    await page.goto(`${baseUrl}/materials/${familyId}`);
    await button(page, 'Archive').click();
    await button(page, 'Restore from archive').waitFor();
    await page.getByRole('link', { name: 'Back to Materials' }).filter({ visible: true }).click();
    await page.waitForURL(`${baseUrl}/materials`);
    await page.getByRole('tab', { name: 'Archived' }).filter({ visible: true }).click();
    await waitForVisibleText(page, name);
    await saveScreenshot(page, 'materials-archived-desktop');
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(session)).toEqual([]);
  });
});
