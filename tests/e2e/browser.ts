import { mkdtempSync, mkdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Client } from 'pg';
import { chromium, type BrowserContext, type Locator, type Page } from 'playwright-core';
import { readEnv } from '../../server/config/env';
import { familiesResponseSchema } from '../../shared/api/families';
import { runDetailSchema } from '../../shared/api/runs';

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
  /** Console errors and warnings of any page of the session (the API's deliberate 4xx answers aside). */
  consoleProblems: string[];
  /** Content-Security-Policy violations (`securitypolicyviolation` events) of any page of the session. */
  policyViolations: string[];
  newPage: (viewport: ViewportName) => Promise<Page>;
  close: () => Promise<void>;
};

/**
 * Console lines that mean something went wrong. Three kinds do not count:
 * Chromium reports every 4xx answer to a fetch as "Failed to load resource",
 * and those are the API's deliberate refusals (wrong password, 409, 422) that
 * tests provoke and assert on their own; it warns when the page closes its own
 * socket during the handshake, as signing out (or being removed) does; and its
 * software GL driver notes a "GPU stall due to ReadPixels" whenever a test
 * reads a chart's pixels. Everything else at error or warning level counts —
 * a socket the policy or the server refused reads differently.
 */
const notProblems = [
  /^Failed to load resource: the server responded with a status of 4\d\d\b/,
  /^WebSocket connection to '[^']+' failed: WebSocket is closed before the connection is established\.$/,
  /^\[\.WebGL-[0-9a-fx]+\]GL Driver Message \(OpenGL, Performance, [A-Z_]+, \w+\): GPU stall due to ReadPixels/,
];

function isProblem(type: string, text: string): boolean {
  return (type === 'error' || type === 'warning') && !notProblems.some((pattern) => pattern.test(text));
}

/** Debian's Chromium with a fresh, throw-away profile directory. */
export async function openBrowser(): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'frostgrade-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath,
    headless: true,
    args: chromiumArgs,
  });
  const pageErrors: string[] = [];
  const consoleProblems: string[] = [];
  const policyViolations: string[] = [];
  return {
    context,
    pageErrors,
    consoleProblems,
    policyViolations,
    newPage: async (viewport) => {
      const page = await context.newPage();
      page.on('pageerror', (error) => pageErrors.push(`${viewport}: ${error.message}`));
      page.on('console', (message) => {
        if (isProblem(message.type(), message.text())) consoleProblems.push(`${viewport}: ${message.type()}: ${message.text()}`);
      });
      await page.exposeBinding('__frostgradePolicyViolation', (_source, text: string) => {
        policyViolations.push(`${viewport}: ${text}`);
      });
      await page.addInitScript(() => {
        document.addEventListener('securitypolicyviolation', (e) => {
          const report = (window as unknown as { __frostgradePolicyViolation: (text: string) => void }).__frostgradePolicyViolation;
          void report(`${e.effectiveDirective} blocked ${e.blockedURI || '(inline)'} at ${e.sourceFile || e.documentURI}:${e.lineNumber}`);
        });
      });
      await page.setViewportSize(viewports[viewport]);
      return page;
    },
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/**
 * Everything that went wrong in the pages of these sessions: uncaught errors,
 * console errors and warnings, and Content-Security-Policy violations. Every
 * suite ends by expecting none.
 */
export function pageProblems(...sessions: BrowserSession[]): string[] {
  return sessions.flatMap((s) => [...s.pageErrors, ...s.consoleProblems, ...s.policyViolations]);
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

/**
 * The chart colours a test looks for: `warm` (ember, a baseline or an
 * over-limit marker) and `glacier` (the first series: a run's optimum, a
 * comparison's first curve). Thresholds in RGB, wide enough for antialiasing.
 */
export type LineColour = 'warm' | 'glacier';

/** Pixels of one chart colour in an element, decoded by the browser. */
export async function countLinePixels(page: Page, element: Locator, colour: LineColour): Promise<number> {
  const png = (await element.screenshot()).toString('base64');
  return page.evaluate(
    async ({ data, colour }) => {
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
      const matches =
        colour === 'warm'
          ? (r: number, g: number, b: number) => r > 150 && r - b > 90 && g < 140
          : (r: number, g: number, b: number) => b > 90 && b - r > 60 && r < 90 && g < 130;
      let count = 0;
      for (let i = 0; i < rgba.length; i += 4) if (matches(rgba[i], rgba[i + 1], rgba[i + 2])) count += 1;
      return count;
    },
    { data: png, colour },
  );
}

/** Pixels of the plotted line's warm colour in an element. */
export const countWarmPixels = (page: Page, element: Locator) => countLinePixels(page, element, 'warm');

/**
 * Waits until a chart has drawn at least `minPixels` pixels of a series
 * colour (warm unless told) on its canvas, or its error boundary speaks, and
 * returns the count.
 */
export async function waitForDrawnChart(page: Page, plot: Locator, minPixels: number, timeout = 60_000, colour: LineColour = 'warm'): Promise<number> {
  await plot.locator('canvas, [role="alert"]').first().waitFor({ state: 'visible', timeout });
  const failure = plot.getByRole('alert');
  if ((await failure.count()) > 0) throw new Error(`chart failed to load: ${await failure.innerText()}`);
  const canvas = plot.locator('canvas').first();
  await canvas.scrollIntoViewIfNeeded();
  let count = 0;
  const deadline = Date.now() + timeout;
  while (count < minPixels && Date.now() < deadline) {
    count = await countLinePixels(page, canvas, colour);
    if (count < minPixels) await page.waitForTimeout(250);
  }
  return count;
}

/** Password of every demo account (README, "Demo accounts"). */
export const demoPassword = 'graded-legs-demo';

/**
 * Signs the whole browser session in as a demo member through the API, so
 * every page of the session (and `session.context.request`) carries the
 * session cookie. Writes must carry the app's Origin.
 */
export async function signInAs(session: BrowserSession, email: string, password = demoPassword): Promise<void> {
  const response = await session.context.request.post(`${baseUrl}/api/auth/sign-in`, {
    data: { email, password },
    headers: { Origin: baseUrl },
  });
  if (!response.ok()) throw new Error(`sign-in as ${email} answered ${response.status()}: ${await response.text()}`);
}

/** GET a JSON endpoint with the session's cookies. */
export async function getJsonAs(session: BrowserSession, path: string): Promise<unknown> {
  const response = await session.context.request.get(`${baseUrl}${path}`, { headers: { Accept: 'application/json' } });
  if (!response.ok()) throw new Error(`GET ${path} answered ${response.status()}`);
  return response.json();
}

/** Either navigation (side rail or bottom tabs), whichever the width shows. */
export function shellNav(page: Page): Locator {
  return page.locator('[data-testid="nav-side-rail"], [data-testid="nav-bottom-tabs"]').filter({ visible: true }).first();
}

/**
 * Signs in through the sign-in page, as a person would, and waits for the
 * shell. Every attempt counts against the account's limit (8 per 15 min):
 * prefer `signInAs` once per session, or fresh invited accounts.
 */
export async function signIn(page: Page, email: string, password = demoPassword): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('field-email').filter({ visible: true }).fill(email);
  await page.getByTestId('field-password').filter({ visible: true }).fill(password);
  await page.getByTestId('submit-sign-in').filter({ visible: true }).click();
  await shellNav(page).waitFor({ state: 'visible', timeout: 30_000 });
}

/** POST JSON with the session's cookies and the app's Origin; answers the parsed body (or null for 204). */
export async function postJsonAs(session: BrowserSession, path: string, data: unknown): Promise<unknown> {
  const response = await session.context.request.post(`${baseUrl}${path}`, { data, headers: { Origin: baseUrl } });
  if (!response.ok()) throw new Error(`POST ${path} answered ${response.status()}: ${await response.text()}`);
  return response.status() === 204 ? null : response.json();
}

export type CaughtMail = { to: string[]; subject: string; text: string; receivedAt: string };

/**
 * The newest e-mail to `address` in the mail catcher's outbox, read with an
 * admin's session (`GET /api/outbox` is admin-only); waits for it to arrive.
 */
export async function waitForMail(adminSession: BrowserSession, address: string, subject: RegExp, timeout = 20_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeout;
  for (;;) {
    const { messages } = (await getJsonAs(adminSession, '/api/outbox')) as { messages: CaughtMail[] };
    const mine = messages
      .filter((m) => m.to.some((to) => to.toLowerCase() === address.toLowerCase()) && subject.test(m.subject))
      .sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
    if (mine.length > 0) return mine[0];
    if (Date.now() > deadline) throw new Error(`no e-mail to ${address} matching ${subject} within ${timeout} ms`);
    await new Promise((resolve) => setTimeout(resolve, 300));
  }
}

/**
 * The newest e-mail to `address` straight from the test stack's catcher
 * table (`captured_mail`), for mail no team's outbox shows — a sign-up link
 * goes to an address that belongs to no team yet. Waits for it to arrive.
 */
export async function waitForCapturedMail(address: string, subject: RegExp, timeout = 20_000): Promise<{ subject: string; text: string }> {
  const db = new Client({ connectionString: readEnv({ ...process.env, FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test' }).databaseUrl });
  await db.connect();
  try {
    const deadline = Date.now() + timeout;
    for (;;) {
      const { rows } = await db.query<{ subject: string; text: string }>(
        'SELECT subject, text FROM captured_mail WHERE $1 = ANY(mail_to) ORDER BY received_at DESC', [address.toLowerCase()]);
      const found = rows.find((m) => subject.test(m.subject));
      if (found) return found;
      if (Date.now() > deadline) throw new Error(`no e-mail to ${address} matching ${subject} within ${timeout} ms`);
      await new Promise((resolve) => setTimeout(resolve, 300));
    }
  } finally {
    await db.end();
  }
}

/** The first link to `path` of this app in a text (e.g. `/join`), with its query. */
export function linkIn(text: string, path: string): string {
  const found = text.match(new RegExp(`https?://[^\\s]+${path}\\?token=[A-Za-z0-9_-]+`));
  if (!found) throw new Error(`no ${path} link in: ${text}`);
  return found[0];
}

/** The first visible match: screens render the phone and the wide layout, one of them hidden. */
export const visible = (locator: Locator) => locator.filter({ visible: true }).first();

/** Polls `probe` every half second until it returns a value; fails naming `what` after `seconds`. */
export async function eventually<T>(probe: () => Promise<T | undefined>, seconds: number, what: string): Promise<T> {
  const deadline = Date.now() + seconds * 1000;
  for (;;) {
    const value = await probe();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`timed out after ${seconds} s waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

/** The demo p-type band-model family (README, "Demo lab"). */
export const demoPFamilyName = /^NL-P7 \(Bi,Sb\)₂Te₃-like, p-type band model$/;

/**
 * A one-start run of the demo p family on a 1.5 mm × 1 mm² leg, launched
 * through the API and awaited until it has succeeded; returns the run's id.
 */
export async function convergedRun(session: BrowserSession, design: { name: string; controlPoints: number; minZoneMm?: number }, seconds = 420): Promise<string> {
  const { families } = familiesResponseSchema.parse(await getJsonAs(session, '/api/families'));
  const family = families.find((f) => demoPFamilyName.test(f.name));
  if (!family) throw new Error('the demo p-type band-model family is missing');
  const created = (await postJsonAs(session, '/api/designs', {
    ...design, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, starts: 1,
  })) as { design: { id: string } };
  const { run } = (await postJsonAs(session, `/api/designs/${created.design.id}/runs`, {})) as { run: { id: string } };
  await eventually(async () => {
    const d = runDetailSchema.parse(await getJsonAs(session, `/api/runs/${run.id}`));
    if (d.run.state === 'failed' || d.run.state === 'cancelled') throw new Error(`the run ${d.run.state}`);
    return d.run.state === 'succeeded' ? true : undefined;
  }, seconds, 'the run to converge');
  return run.id;
}

/** Clicks the page's "Choose CSV file" (or "Choose another file") button and answers the browser's file chooser. */
export async function chooseCsvFile(page: Page, name: string, contents: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await visible(page.getByRole('button', { name: /^Choose (CSV file|another file)$/ })).click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(contents, 'utf8') });
}
