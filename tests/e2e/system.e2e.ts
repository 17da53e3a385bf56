import { baseUrl, openBrowser, saveScreenshot, signInAs, visible, waitForVisibleText, type BrowserSession, type ViewportName } from './browser';

jest.setTimeout(120_000);

/**
 * The System page as someone who is not on this machine sees it: the
 * browser runs on the test host, so every request says it came through a
 * proxy (otherwise the API counts it as the local operator, who sees all).
 */
const throughProxy = { 'X-Forwarded-For': '203.0.113.7' };

describe.each([
  ['a viewer', 'vic@northlight.example', false],
  ['an admin', 'ada@northlight.example', true],
] as const)('the System page for %s behind a proxy', (_who, email, seesChecks) => {
  let session: BrowserSession;

  beforeAll(async () => {
    session = await openBrowser();
    await signInAs(session, email);
    await session.context.setExtraHTTPHeaders(throughProxy);
  });

  afterAll(async () => {
    await session?.close();
  });

  it.each<ViewportName>(['phone', 'desktop'])(`shows ${seesChecks ? 'every check' : 'ok or degraded only'} at %s width`, async (viewport) => {
    const page = await session.newPage(viewport);
    await page.goto(`${baseUrl}/system`);
    await waitForVisibleText(page, 'All systems working');
    if (seesChecks) {
      await visible(page.getByRole('list', { name: 'Health checks' })).waitFor();
      for (const label of ['Database: working', 'Job queue: working', 'Workers: working', 'Mail: working']) await visible(page.getByLabel(label)).waitFor();
      expect(await page.getByTestId('health-details-hidden').filter({ visible: true }).count()).toBe(0);
    } else {
      await visible(page.getByTestId('health-details-hidden')).waitFor();
      expect(await page.getByRole('list', { name: 'Health checks' }).filter({ visible: true }).count()).toBe(0);
      expect(await page.getByText(/PostgreSQL|SMTP|heartbeat/).filter({ visible: true }).count()).toBe(0);
    }
    await saveScreenshot(page, `system-${seesChecks ? 'admin' : 'viewer'}-${viewport}`);
    await page.close();
    expect(session.pageErrors).toEqual([]);
  });
});
