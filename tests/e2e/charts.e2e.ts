import type { Locator, Page } from 'playwright-core';
import { baseUrl, openBrowser, saveScreenshot, type BrowserSession } from './browser';

jest.setTimeout(120_000);

/** Pixels of the plotted line's warm colour in an element, decoded by the browser. */
async function countWarmPixels(page: Page, element: Locator): Promise<number> {
  const png = (await element.screenshot()).toString('base64');
  return page.evaluate(async (data) => {
    const image = new Image();
    image.src = `data:image/png;base64,${data}`;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = image.width;
    canvas.height = image.height;
    const context = canvas.getContext('2d');
    if (!context) throw new Error('no 2d context');
    context.drawImage(image, 0, 0);
    const { data: rgba } = context.getImageData(0, 0, image.width, image.height);
    let warm = 0;
    for (let i = 0; i < rgba.length; i += 4) {
      const [r, g, b] = [rgba[i], rgba[i + 1], rgba[i + 2]];
      if (r > 150 && r - b > 90 && g < 140) warm += 1;
    }
    return warm;
  }, png);
}

describe('charts on the web', () => {
  let session: BrowserSession;

  beforeAll(async () => {
    session = await openBrowser();
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
    expect(session.pageErrors).toEqual([]);
  });
});
