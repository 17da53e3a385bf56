import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import type { Env } from '../../server/config/env';
import { demo, openContext, signedIn, type TestContext } from './context';

let ctx: TestContext;
beforeAll(async () => { ctx = await openContext(); });
afterAll(async () => { await ctx.close(); });

const appWith = (env: Partial<Env>) => createApp({ env: { ...ctx.env, ...env }, ds: ctx.ds, boss: ctx.boss, mailer: ctx.mailer, auth: ctx.auth, version: 'test' });

/** The CSP header as directive → sources. */
function csp(header: string | undefined): Map<string, string[]> {
  if (!header) throw new Error('no Content-Security-Policy header');
  return new Map(header.split(';').map((d) => d.trim().split(/\s+/)).map(([name, ...sources]) => [name!, sources]));
}

/** The body's bytes after the transfer encoding is undone (superagent inflates gzip and brotli). */
const bytes = (res: request.Response, callback: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => callback(null, Buffer.concat(chunks)));
};

/** Headers every answer carries, API or web app. */
function expectCommonHeaders(res: request.Response): void {
  expect(res.headers['x-content-type-options']).toBe('nosniff');
  expect(res.headers['referrer-policy']).toBe('strict-origin-when-cross-origin');
  expect(res.headers['x-frame-options']).toBe('DENY');
  expect(csp(res.headers['content-security-policy']).get('frame-ancestors')).toEqual(["'none'"]);
  expect(res.headers['x-powered-by']).toBeUndefined();
}

describe('security headers', () => {
  it('an API answer may load and frame nothing, and over http carries no HSTS', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.status).toBe(200);
    expectCommonHeaders(res);
    expect(csp(res.headers['content-security-policy']).get('default-src')).toEqual(["'none'"]);
    expect(res.headers['strict-transport-security']).toBeUndefined();
  });

  it("the web app's index.html allows its own scripts and WebAssembly, never inline or eval'd script, and sockets to its own origin", async () => {
    for (const path of ['/', '/sign-in', '/materials/00000000-0000-0000-0000-000000000000']) {
      const res = await request(ctx.app).get(path);
      expect(res.status).toBe(200);
      expect(res.type).toBe('text/html');
      expect(res.text).toContain('<div id="root">');
      expectCommonHeaders(res);
      const policy = csp(res.headers['content-security-policy']);
      expect(policy.get('default-src')).toEqual(["'self'"]);
      expect(policy.get('script-src')).toEqual(expect.arrayContaining(["'self'", "'wasm-unsafe-eval'"]));
      expect(policy.get('script-src')).not.toContain("'unsafe-inline'");
      expect(policy.get('script-src')).not.toContain("'unsafe-eval'");
      expect(policy.get('connect-src')).toEqual(["'self'", `ws://${new URL(ctx.env.appOrigin).host}`]);
      expect(policy.get('object-src')).toEqual(["'none'"]);
      expect(policy.has('upgrade-insecure-requests')).toBe(false);
      expect(res.headers['strict-transport-security']).toBeUndefined();
      expect(res.headers['cache-control']).toBe('no-cache');
    }
  });

  it('HSTS, wss and upgrade-insecure-requests only when APP_ORIGIN is https', async () => {
    const app = appWith({ appOrigin: 'https://frostgrade.example' });
    for (const path of ['/api/health', '/']) {
      const res = await request(app).get(path);
      expectCommonHeaders(res);
      expect(res.headers['strict-transport-security']).toBe('max-age=31536000');
    }
    const policy = csp((await request(app).get('/')).headers['content-security-policy']);
    expect(policy.get('connect-src')).toEqual(["'self'", 'wss://frostgrade.example']);
    expect(policy.has('upgrade-insecure-requests')).toBe(true);
  });
});

describe('compression and caching of the exported web app', () => {
  // The export `npm test` made before the stack started.
  const dist = () => resolve(ctx.env.webDist);
  const bundles = () => [...readFileSync(join(dist(), 'index.html'), 'utf8').matchAll(/<script src="([^"]+)"/g)].map((m) => m[1]!);

  it('bundles go compressed and are kept for a year; a new build gives them new names', async () => {
    expect(bundles().length).toBeGreaterThan(0);
    for (const [path, encoding] of bundles().map((p, i) => [p, i % 2 ? 'gzip' : 'br'] as const)) {
      const res = await request(ctx.app).get(path).set('Accept-Encoding', encoding).buffer(true).parse(bytes);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe(encoding);
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect((res.body as Buffer).equals(readFileSync(join(dist(), path)))).toBe(true);
    }
  });

  it("CanvasKit's WebAssembly goes compressed and is revalidated before use (its name carries no hash)", async () => {
    const res = await request(ctx.app).get('/canvaskit.wasm').set('Accept-Encoding', 'gzip').buffer(true).parse(bytes);
    expect(res.status).toBe(200);
    expect(res.type).toBe('application/wasm');
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['cache-control']).toBe('no-cache');
    const again = await request(ctx.app).get('/canvaskit.wasm').set('If-None-Match', res.headers.etag!);
    expect(again.status).toBe(304);
  });

  it('JSON answers go compressed when large enough to gain', async () => {
    const client = await signedIn(ctx, demo.viewer);
    const res = await client.get('/api/families').set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.body.families.length).toBeGreaterThan(0);
  });

  it('a bundle this build does not have answers 404, not the app page', async () => {
    const res = await request(ctx.app).get('/_expo/static/js/web/app-entry-00000000000000000000000000000000.js');
    expect(res.status).toBe(404);
    expect(res.type).not.toBe('text/html');
  });
});

describe('an export with an inline script', () => {
  let dir: string;
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'frostgrade-dist-'));
    mkdirSync(join(dir, 'assets', 'fonts'), { recursive: true });
    writeFileSync(join(dir, 'index.html'), '<!DOCTYPE html><html><head><script>window.__boot = 1;</script></head><body><div id="root"></div></body></html>');
    writeFileSync(join(dir, 'assets', 'fonts', 'Plex.0123456789abcdef0123456789abcdef.ttf'), 'not really a font');
    writeFileSync(join(dir, 'assets', 'fonts', 'unhashed.ttf'), 'not really a font');
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('allows exactly that script, by its hash', async () => {
    const res = await request(appWith({ webDist: dir })).get('/');
    const hash = `'sha256-${createHash('sha256').update('window.__boot = 1;').digest('base64')}'`;
    expect(csp(res.headers['content-security-policy']).get('script-src')).toEqual(["'self'", "'wasm-unsafe-eval'", hash]);
  });

  it('keeps a content-hashed asset for a year and revalidates one without a hash', async () => {
    const app = appWith({ webDist: dir });
    expect((await request(app).get('/assets/fonts/Plex.0123456789abcdef0123456789abcdef.ttf')).headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect((await request(app).get('/assets/fonts/unhashed.ttf')).headers['cache-control']).toBe('no-cache');
  });
});
