import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** Where the app under test is served (API and web build at one origin). */
export const baseUrl = (process.env.FROSTGRADE_E2E_URL ?? 'http://127.0.0.1:8341').replace(/\/+$/, '');

export const chromiumPath = process.env.FROSTGRADE_CHROMIUM ?? '/usr/bin/chromium';

const chromiumArgs = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const viewports = {
  phone: { width: 390, height: 844 },
  desktop: { width: 1280, height: 800 },
} as const;
export type ViewportName = keyof typeof viewports;

export const screenshotDir = resolve(__dirname, '..', '..', 'test-results', 'screenshots');

export type BrowserSession = {
  context: BrowserContext;
  /** Uncaught page errors seen so far, in any page of the session. */
  pageErrors: string[];
  newPage: (viewport: ViewportName) => Promise<Page>;
  close: () => Promise<void>;
};

/** Debian's Chromium with a fresh, throw-away profile directory. */
export async function openBrowser(): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'frostgrade-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath,
    headless: true,
    args: chromiumArgs,
  });
  const pageErrors: string[] = [];
  return {
    context,
    pageErrors,
    newPage: async (viewport) => {
      const page = await context.newPage();
      page.on('pageerror', (error) => pageErrors.push(`${viewport}: ${error.message}`));
      await page.setViewportSize(viewports[viewport]);
      return page;
    },
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** GET a JSON endpoint of the app under test (from Node, not the page). */
export async function getJson(path: string): Promise<unknown> {
  const response = await fetch(`${baseUrl}${path}`, { headers: { Accept: 'application/json' } });
  if (!response.ok) throw new Error(`GET ${path} answered ${response.status}`);
  return response.json();
}

export async function saveScreenshot(page: Page, name: string): Promise<string> {
  mkdirSync(screenshotDir, { recursive: true });
  const path = join(screenshotDir, `${name}.png`);
  await page.screenshot({ path, fullPage: false });
  return path;
}

/** Waits until text is shown in a visible element (hidden stack screens stay in the DOM). */
export async function waitForVisibleText(page: Page, text: string, timeout = 30_000): Promise<void> {
  await page.getByText(text, { exact: true }).filter({ visible: true }).first().waitFor({
    state: 'visible',
    timeout,
  });
}
