import 'reflect-metadata';
import { join } from 'node:path';
import { readEnv } from '../config/env';
import { demoPassword, demoTeam, demoUsers } from '../db/seed/demo-data';
import { prepareDatabase } from './database';
import { log } from './log';
import { stopCluster } from './postgres';
import { portInUse, waitForHealth } from './stack';
import { stackServices, startServices, type Service } from './supervise';
import { ensureWebBuild } from './web-build';

/**
 * `npm start`: PostgreSQL, migrations, demo data, the web export, then the
 * mail catcher, API and one worker as child processes. `--dev` replaces the
 * export with Expo's hot-reloading dev server on :8081.
 */
async function main(): Promise<void> {
  const dev = process.argv.includes('--dev');
  const t0 = Date.now();
  const env = readEnv({ ...process.env, FROSTGRADE_PROFILE: 'dev' });
  const root = join(__dirname, '..', '..');
  for (const port of [env.port, env.smtp.port]) {
    if (await portInUse(port)) throw new Error(`port ${port} is already in use: is another Frostgrade running? Stop it or set PORT / SMTP_PORT.`);
  }
  const cluster = await prepareDatabase(env, { fresh: false });
  if (!dev) ensureWebBuild(root, env.webDist);
  const services: Service[] = stackServices(env.workers);
  if (dev) {
    services.push({ name: 'expo', entry: 'npx', args: ['expo', 'start', '--web', '--port', '8081'], env: { CI: '1', EXPO_OFFLINE: '1', EXPO_UNSTABLE_HEADLESS: '1', EXPO_PUBLIC_API_URL: env.appOrigin } });
  }
  const childEnv = { ...process.env, FROSTGRADE_PROFILE: 'dev' };
  let shuttingDown = false;
  const shutdown = async (code: number): Promise<void> => {
    if (shuttingDown) return;
    shuttingDown = true;
    log('frostgrade', 'stopping…');
    await stack.stop();
    if (cluster.startedHere) stopCluster(cluster);
    log('frostgrade', 'stopped');
    process.exit(code);
  };
  // A crashed child is restarted with backoff (server/ops/supervise.ts); only one that keeps crashing stops the stack.
  const stack = startServices(services, childEnv, {
    onGiveUp: (name) => {
      log('frostgrade', `giving up: ${name} keeps crashing (see above); stopping everything`);
      void shutdown(1);
    },
  });
  process.on('SIGINT', () => void shutdown(0));
  process.on('SIGTERM', () => void shutdown(0));
  await waitForHealth(`${env.appOrigin}/api/health`, 90);
  const url = dev ? 'http://127.0.0.1:8081 (API at ' + env.appOrigin + ')' : env.appOrigin;
  log('frostgrade', [
    `ready in ${((Date.now() - t0) / 1000).toFixed(1)} s`,
    `  open      ${url}`,
    `  demo lab  ${demoTeam.name}; every demo account's password is ${demoPassword}`,
    ...demoUsers.map((u) => `            ${u.email.padEnd(26)} ${u.role}${u.team === demoTeam.slug ? '' : ' (second team)'}`),
    `  mail      SMTP catcher on ${env.smtp.host}:${env.smtp.port}, messages in the app's Outbox`,
    `  database  ${env.databaseUrl}`,
    `  workers   ${env.workers} (WORKERS=N npm start for more); a crashed process is restarted`,
    '  Ctrl-C stops everything.',
  ].join('\n'));
}

main().catch((err: Error) => {
  console.error(`[frostgrade] ${err.message}`);
  process.exit(1);
});
