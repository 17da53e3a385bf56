import 'reflect-metadata';
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { readEnv } from '../server/config/env';
import { prepareDatabase } from '../server/ops/database';
import { log } from '../server/ops/log';
import { stopCluster } from '../server/ops/postgres';
import { portInUse, waitForHealth } from '../server/ops/stack';
import { stackServices, startServices } from '../server/ops/supervise';
import { ensureWebBuild } from '../server/ops/web-build';

/**
 * `npm test`: a fresh test database on its own cluster and ports, then
 * type-check, lint, every jest project (shared, server, client, e2e) against
 * the running test stack, and one closing line `N passed, N failed`.
 * Arguments are handed to jest (`npm test -- tests/server/health`), and
 * then type-check and lint are skipped to keep a focused run quick.
 */
const root = join(__dirname, '..');

/** Debian packages the browser tests drive: Chromium, and poppler's pdftotext to read the printed growth sheet. */
const browserTools = [
  { binary: '/usr/bin/chromium', pkg: 'chromium' },
  { binary: '/usr/bin/pdftotext', pkg: 'poppler-utils' },
];

function ensureBrowserTools(): void {
  const missing = browserTools.filter((t) => !existsSync(t.binary)).map((t) => t.pkg);
  if (missing.length === 0) return;
  log('setup', `installing Debian packages for the browser tests: ${missing.join(' ')}`);
  execFileSync('bash', ['-c', `apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq ${missing.join(' ')} >/dev/null`], { stdio: 'inherit' });
}

function step(name: string, cmd: string, args: string[]): boolean {
  const t0 = Date.now();
  log('test', `${name}…`);
  const r = spawnSync(cmd, args, { cwd: root, stdio: 'inherit' });
  const ok = r.status === 0;
  log('test', `${name} ${ok ? 'passed' : 'FAILED'} in ${((Date.now() - t0) / 1000).toFixed(1)} s`);
  return ok;
}

type JestSummary = { numPassedTests: number; numFailedTests: number; numPendingTests: number; numRuntimeErrorTestSuites: number };

async function main(): Promise<void> {
  const jestArgs = process.argv.slice(2);
  const focused = jestArgs.some((a) => !a.startsWith('-'));
  const childEnv = { ...process.env, FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test' } as NodeJS.ProcessEnv;
  const env = readEnv(childEnv);
  ensureBrowserTools();
  for (const port of [env.port, env.smtp.port]) {
    if (await portInUse(port)) throw new Error(`port ${port} is in use: is another test run going? (set PORT / SMTP_PORT)`);
  }
  const { cluster } = await prepareDatabase(env, { fresh: true });
  const steps: Array<[string, boolean]> = [];
  if (!focused) {
    steps.push(['typecheck', step('typecheck', 'npx', ['tsc', '--noEmit', '-p', 'tsconfig.json'])]);
    steps.push(['lint', step('lint', 'npx', ['eslint', '.', '--max-warnings', '0'])]);
  }
  ensureWebBuild(root, env.webDist);
  const crashes: string[] = [];
  // Restarted so later tests still have a stack, but every unexpected exit counts as a failure.
  const stack = startServices(stackServices(), childEnv, { onExit: (name, how) => crashes.push(`${name} ${how}`) });
  let summary: JestSummary = { numPassedTests: 0, numFailedTests: 0, numPendingTests: 0, numRuntimeErrorTestSuites: 1 };
  try {
    await waitForHealth(`${env.appOrigin}/api/health`, 90);
    mkdirSync(join(root, 'test-results'), { recursive: true });
    const out = join(root, 'test-results', 'jest.json');
    spawnSync('npx', ['jest', '--json', '--outputFile', out, ...jestArgs], {
      cwd: root,
      stdio: 'inherit',
      env: { ...childEnv, FROSTGRADE_E2E_URL: env.appOrigin },
    });
    if (existsSync(out)) summary = JSON.parse(readFileSync(out, 'utf8')) as JestSummary;
  } finally {
    await stack.stop();
    if (cluster?.startedHere) stopCluster(cluster);
  }
  const stepFailures = steps.filter(([, ok]) => !ok).map(([n]) => n);
  for (const [n, ok] of steps) log('test', `${n}: ${ok ? 'passed' : 'failed'}`);
  for (const c of crashes) log('test', `service crash during the run: ${c}`);
  if (summary.numRuntimeErrorTestSuites > 0) log('test', `${summary.numRuntimeErrorTestSuites} test file(s) failed to run`);
  // Type-check and lint count as one check each; a test file that could not run counts as a failure.
  const passed = summary.numPassedTests + steps.length - stepFailures.length;
  const failed = summary.numFailedTests + summary.numRuntimeErrorTestSuites + stepFailures.length + crashes.length;
  if (summary.numPendingTests > 0) log('test', `${summary.numPendingTests} skipped`);
  process.stdout.write(`${passed} passed, ${failed} failed\n`);
  process.exit(failed > 0 || passed === 0 ? 1 : 0);
}

main().catch((err: Error) => {
  console.error(`[test] ${err.message}`);
  process.stdout.write('0 passed, 1 failed\n');
  process.exit(1);
});
