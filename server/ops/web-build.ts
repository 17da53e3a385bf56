import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { log } from './log';

// Generated at export time (Metro copies CanvasKit into public/), so not an input.
const generated = new Set(['public/canvaskit.wasm']);
const inputs = ['app', 'components', 'shared', 'assets', 'public', 'app.json', 'package-lock.json', 'babel.config.js', 'metro.config.js'];

function hashTree(root: string, path: string, h: ReturnType<typeof createHash>): void {
  const full = join(root, path);
  if (!existsSync(full) || generated.has(path)) return;
  if (statSync(full).isDirectory()) {
    for (const name of readdirSync(full).sort()) if (!name.startsWith('.') && name !== 'node_modules') hashTree(root, join(path, name), h);
  } else {
    h.update(path).update(readFileSync(full));
  }
}

/** Exports the web client into `dist/` unless a build of exactly these sources is there. */
export function ensureWebBuild(root: string, dist: string): void {
  const h = createHash('sha1');
  for (const p of inputs) hashTree(root, p, h);
  const digest = h.digest('hex');
  const stamp = join(dist, '.sources-sha1');
  if (existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === digest && existsSync(join(dist, 'index.html'))) {
    log('web', 'web build is up to date');
    return;
  }
  log('web', 'exporting the web app (1–2 min cold, ~10 s warm)…');
  const t0 = Date.now();
  const r = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', dist], {
    cwd: root,
    stdio: ['ignore', 'pipe', 'pipe'],
    encoding: 'utf8',
    env: { ...process.env, CI: '1', EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1', NODE_ENV: 'production' },
  });
  if (r.status !== 0) {
    process.stderr.write(r.stdout + r.stderr);
    throw new Error('expo export failed');
  }
  writeFileSync(stamp, `${digest}\n`);
  log('web', `exported in ${((Date.now() - t0) / 1000).toFixed(0)} s`);
}
