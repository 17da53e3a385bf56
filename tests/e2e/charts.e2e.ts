import { baseUrl, countWarmPixels, openBrowser, pageProblems, saveScreenshot, signInAs, type BrowserSession } from './browser';

jest.setTimeout(120_000);

describe('charts on the web', () => {
  let session: BrowserSession;

  beforeAll(async () => {
    session = await openBrowser();
    await signInAs(session, 'vic@northlight.example');
  });

  afterAll(async () => {
    await session?.close();
  });

  it('loads CanvasKit after mount and draws the sample curve', async () => {
    const page = await session.newPage('desktop');
    await page.goto(`${baseUrl}/system`);
    const plot = page.getByTestId('line-plot').filter({ visible: true });
    // Either the canvas appears or the chart's error boundary says why not.
    await plot.locator('canvas, [role="alert"]').first().waitFor({ state: 'visible', timeout: 60_000 });
    const failure = plot.getByRole('alert');
    if ((await failure.count()) > 0) {
      await saveScreenshot(page, 'chart-desktop');
      throw new Error(`chart failed to load: ${await failure.innerText()}`);
    }

    let warm = 0;
    const deadline = Date.now() + 30_000;
    while (warm < 300 && Date.now() < deadline) {
      warm = await countWarmPixels(page, plot);
      if (warm < 300) await page.waitForTimeout(250);
    }
    await plot.scrollIntoViewIfNeeded();
    await saveScreenshot(page, 'chart-desktop');
    expect(warm).toBeGreaterThanOrEqual(300);
    expect(pageProblems(session)).toEqual([]);
  });
});
