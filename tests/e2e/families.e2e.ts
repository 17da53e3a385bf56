import type { Page } from 'playwright-core';
import { familiesResponseSchema } from '../../shared/api/families';
import {
  baseUrl,
  getJsonAs,
  openBrowser,
  pageProblems,
  saveScreenshot,
  signInAs,
  viewports,
  waitForVisibleText,
  type BrowserSession,
  type ViewportName,
} from './browser';

jest.setTimeout(180_000);

type Box = { x: number; y: number; width: number; height: number };

async function visibleBox(page: Page, testId: string): Promise<Box | null> {
  const nav = page.getByTestId(testId).filter({ visible: true });
  if ((await nav.count()) === 0) return null;
  return nav.first().boundingBox();
}

describe('materials home in a real browser', () => {
  let session: BrowserSession;
  let familyNames: string[];

  beforeAll(async () => {
    session = await openBrowser();
    // An admin sees every tab, the Outbox included (README, "Demo accounts").
    await signInAs(session, 'ada@northlight.example');
    const families = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
    familyNames = families.families.map((family) => family.name);
  });

  afterAll(async () => {
    await session?.close();
  });

  it('has demo families to show', () => {
    expect(familyNames.length).toBeGreaterThan(0);
  });

  it.each<ViewportName>(['phone', 'desktop'])('lists every family at %s width', async (name) => {
    const page = await session.newPage(name);
    await page.goto(`${baseUrl}/`);
    for (const familyName of familyNames) await waitForVisibleText(page, familyName);
    await saveScreenshot(page, `materials-${name}`);
    await page.close();
  });

  it('uses bottom tabs on a phone and a side rail on a desktop', async () => {
    const phone = await session.newPage('phone');
    await phone.goto(`${baseUrl}/`);
    await waitForVisibleText(phone, familyNames[0]);
    const bar = await visibleBox(phone, 'nav-bottom-tabs');
    expect(bar).not.toBeNull();
    expect(await visibleBox(phone, 'nav-side-rail')).toBeNull();
    expect(bar!.width).toBeCloseTo(viewports.phone.width, 0);
    expect(bar!.y + bar!.height).toBeCloseTo(viewports.phone.height, 0);

    const desktop = await session.newPage('desktop');
    await desktop.goto(`${baseUrl}/`);
    await waitForVisibleText(desktop, familyNames[0]);
    const rail = await visibleBox(desktop, 'nav-side-rail');
    expect(rail).not.toBeNull();
    expect(await visibleBox(desktop, 'nav-bottom-tabs')).toBeNull();
    expect(rail!.x).toBe(0);
    expect(rail!.height).toBeCloseTo(viewports.desktop.height, 0);
    expect(rail!.width).toBeLessThan(viewports.desktop.width / 3);
    await Promise.all([phone.close(), desktop.close()]);
  });

  it.each<ViewportName>(['phone', 'desktop'])('switches to System and Outbox at %s width', async (name) => {
    const page = await session.newPage(name);
    await page.goto(`${baseUrl}/`);
    await waitForVisibleText(page, familyNames[0]);

    await page.getByRole('tab', { name: 'System' }).filter({ visible: true }).click();
    await page.waitForURL(`${baseUrl}/system`);
    await waitForVisibleText(page, 'Database');
    await saveScreenshot(page, `system-${name}`);

    await page.getByRole('tab', { name: 'Outbox' }).filter({ visible: true }).click();
    await page.waitForURL(`${baseUrl}/outbox`);
    await page.getByRole('heading', { name: 'Outbox' }).filter({ visible: true }).waitFor();
    await saveScreenshot(page, `outbox-${name}`);
    await page.close();
  });

  it('raised no uncaught errors in the page', () => {
    expect(pageProblems(session)).toEqual([]);
  });
});
