/**
 * First-load figures for `npm run bench` (printed, never asserted): how many
 * bytes a browser with an empty cache fetches, and how long until the
 * content is on screen, over an emulated 10 Mbit/s link with 40 ms latency —
 * for the sign-in page, the first signed-in page (Materials, no charts) and a
 * page with charts (a family's page, which also fetches CanvasKit's
 * WebAssembly). It stands up its own database, API and mail catcher, exports
 * the web app if its sources changed, and drives Debian's Chromium; ports and
 * cluster follow PORT, SMTP_PORT, PG_PORT and PG_DATA_ROOT when set.
 */
import 'reflect-metadata';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type CDPSession, type Page } from 'playwright-core';
import { readEnv } from '../../server/config/env';
import { prepareDatabase } from '../../server/ops/database';
import { stopCluster } from '../../server/ops/postgres';
import { startServices } from '../../server/ops/supervise';
import { ensureWebBuild } from '../../server/ops/web-build';
import { chromiumPath, demoPassword } from '../e2e/browser';

const settings = { FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test', PORT: process.env.PORT ?? '8394', SMTP_PORT: process.env.SMTP_PORT ?? '2594' };
// The bench's own database on the test profile's private cluster (started here if needed); the API child is pointed at it.
const base = readEnv({ ...process.env, ...settings });
const env = { ...base, databaseUrl: `postgres://postgres@127.0.0.1:${base.pgPort}/frostgrade_bench_first_load` };
const childEnv = { ...process.env, ...settings, DATABASE_URL: env.databaseUrl } as NodeJS.ProcessEnv;
const root = join(__dirname, '..', '..');

/** The link: ≈ 10 Mbit/s down, 5 Mbit/s up, 40 ms latency (Chromium's throughput is in bytes per second). */
const link = { offline: false, latency: 40, downloadThroughput: (10e6 / 8), uploadThroughput: (5e6 / 8) };
const repeats = 3;

type Load = { ms: number; bytes: number; wasmBytes: number; requests: number; encodings: Set<string> };

/**
 * Counts what the page fetches from the moment it is attached: bytes on the
 * wire (headers included, compressed when the server compressed), requests,
 * and how many of the bytes were the chart engine's WebAssembly.
 */
async function meter(cdp: CDPSession): Promise<() => Omit<Load, 'ms'>> {
  const urls = new Map<string, string>();
  const encodings = new Set<string>();
  let bytes = 0;
  let wasmBytes = 0;
  let requests = 0;
  cdp.on('Network.responseReceived', (e) => {
    urls.set(e.requestId, e.response.url);
    const encoding = Object.entries(e.response.headers).find(([k]) => k.toLowerCase() === 'content-encoding')?.[1];
    if (encoding) encodings.add(String(encoding));
  });
  cdp.on('Network.loadingFinished', (e) => {
    requests += 1;
    bytes += e.encodedDataLength;
    if (urls.get(e.requestId)?.endsWith('.wasm')) wasmBytes += e.encodedDataLength;
  });
  await cdp.send('Network.enable');
  await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
  await cdp.send('Network.emulateNetworkConditions', link);
  return () => ({ bytes, wasmBytes, requests, encodings });
}

/** A fresh context (empty cache, optionally signed in), one page loaded until `ready` resolves. */
async function coldLoad(browser: Browser, path: string, cookie: string | null, ready: (page: Page) => Promise<void>): Promise<Load> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  try {
    if (cookie) {
      const at = cookie.indexOf('=');
      await context.addCookies([{ name: cookie.slice(0, at), value: cookie.slice(at + 1), url: env.appOrigin }]);
    }
    const page = await context.newPage();
    const read = await meter(await context.newCDPSession(page));
    const t0 = performance.now();
    await page.goto(`${env.appOrigin}${path}`, { waitUntil: 'commit' });
    await ready(page);
    const ms = performance.now() - t0;
    // Requests still in flight when the content showed (e.g. a late font) count too.
    await page.waitForLoadState('networkidle');
    return { ms, ...read() };
  } finally {
    await context.close();
  }
}

const visibleText = (text: string | RegExp) => async (page: Page): Promise<void> => {
  await page.getByText(text).filter({ visible: true }).first().waitFor({ state: 'visible', timeout: 120_000 });
};

/** A chart has drawn once its canvas is on screen (CanvasKit loaded and the drawing code ran). */
const chartDrawn = async (page: Page): Promise<void> => {
  await page.locator('canvas').filter({ visible: true }).first().waitFor({ state: 'visible', timeout: 120_000 });
};

/** No worker runs here, so health stays "degraded": wait until the API answers at all. */
async function apiAnswers(): Promise<void> {
  for (let i = 0; i < 180; i += 1) {
    if (await fetch(`${env.appOrigin}/api/health`).then(() => true, () => false)) return;
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error('the API did not answer within 90 s');
}

async function signInCookie(): Promise<string> {
  const res = await fetch(`${env.appOrigin}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: env.appOrigin },
    body: JSON.stringify({ email: 'vic@northlight.example', password: demoPassword }),
  });
  if (!res.ok) throw new Error(`sign-in answered ${res.status}`);
  const cookie = res.headers.get('set-cookie')?.split(';')[0];
  if (!cookie) throw new Error('sign-in set no cookie');
  return cookie;
}

async function familyPath(cookie: string): Promise<string> {
  const res = await fetch(`${env.appOrigin}/api/families`, { headers: { cookie } });
  const { families } = (await res.json()) as { families: Array<{ id: string; name: string }> };
  const family = families.find((f) => /^NL-P7 /.test(f.name));
  if (!family) throw new Error('the demo p-type family is missing');
  return `/materials/${family.id}`;
}

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const mb = (bytes: number): string => `${(bytes / 1e6).toFixed(2)} MB`;

function report(name: string, loads: Load[]): void {
  const last = loads[loads.length - 1]!;
  const wasm = last.wasmBytes > 0 ? `, of which WebAssembly ${mb(last.wasmBytes)}` : ', no WebAssembly';
  const encodings = last.encodings.size > 0 ? [...last.encodings].join('+') : 'none';
  console.log(`${name}: ${mb(last.bytes)} transferred in ${last.requests} requests${wasm} (content-encoding: ${encodings}); content visible after median ${median(loads.map((l) => l.ms)).toFixed(0)} ms (runs: ${loads.map((l) => l.ms.toFixed(0)).join(', ')})`);
}

async function main(): Promise<void> {
  const { cluster } = await prepareDatabase(env, { fresh: true });
  ensureWebBuild(root, env.webDist);
  const stack = startServices([{ name: 'mail', entry: 'server/mail/catcher-main.ts' }, { name: 'api', entry: 'server/main.ts' }], childEnv, { restart: false, onExit: (name, how) => { throw new Error(`${name} ${how}`); } });
  const browser = await chromium.launch({ executablePath: chromiumPath, args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--disable-background-networking'] });
  // The children's own log lines would interleave with the figures.
  const origWrite = process.stdout.write.bind(process.stdout);
  process.stdout.write = ((chunk: string | Uint8Array) => (typeof chunk === 'string' && /^\[(api|mail)\]/.test(chunk) ? true : origWrite(chunk))) as typeof process.stdout.write;
  try {
    await apiAnswers();
    const cookie = await signInCookie();
    const chartPage = await familyPath(cookie);
    console.log(`Frostgrade first-load benchmark — node ${process.version}, ${new Date().toISOString()}, load average ${loadavg().map((v) => v.toFixed(2)).join(' ')}`);
    console.log(`Chromium, empty cache, 1280 × 800, link ${link.downloadThroughput * 8 / 1e6} Mbit/s down, ${link.latency} ms latency; ${repeats} loads each`);
    const cases: Array<[string, string, string | null, (page: Page) => Promise<void>]> = [
      ['sign-in page (until the e-mail field shows)', '/sign-in', null, async (page) => page.getByTestId('field-email').filter({ visible: true }).first().waitFor({ state: 'visible', timeout: 120_000 })],
      ['first signed-in page, Materials (until a family card shows)', '/', cookie, visibleText(/^NL-P7 /)],
      ['a family page with charts (until a chart has drawn)', chartPage, cookie, chartDrawn],
    ];
    await coldLoad(browser, '/sign-in', null, cases[0]![3]); // the first load warms the server's file cache; not counted
    for (const [name, path, withCookie, ready] of cases) {
      const loads: Load[] = [];
      for (let i = 0; i < repeats; i += 1) loads.push(await coldLoad(browser, path, withCookie, ready));
      report(name, loads);
    }
  } finally {
    process.stdout.write = origWrite;
    await browser.close();
    await stack.stop();
    if (cluster?.startedHere) stopCluster(cluster);
  }
}

main().then(() => process.exit(0), (err: Error) => {
  console.error(`bench failed: ${err.message}`);
  process.exit(1);
});
