import 'reflect-metadata';
import { join } from 'node:path';
import { productionProblems, readEnv, type Env } from '../config/env';
import { demoPassword, demoTeam, demoUsers } from '../db/seed/demo-data';
import { prepareDatabase, type Database } from './database';
import { log } from './log';
import { stopCluster } from './postgres';
import { portInUse, waitForHealth } from './stack';
import { stackServices, startServices, type Service } from './supervise';
import { ensureWebBuild } from './web-build';

/** Where this machine reaches its own API (APP_ORIGIN may be a proxy's public address). */
const localOrigin = (env: Env): string => `http://${env.host === '0.0.0.0' || env.host === '::' ? '127.0.0.1' : env.host}:${env.port}`;

function readyLines(env: Env, db: Database, production: boolean): string[] {
  const where = db.cluster ? `private cluster on 127.0.0.1:${db.cluster.port} (${db.cluster.dataDir}${db.cluster.password ? ', password in the postgres-password file beside it' : ''})` : 'DATABASE_URL';
  if (production) {
    return [
      `  serving   ${localOrigin(env)} for ${env.appOrigin} (behind your reverse proxy; TRUST_PROXY=${String(env.trustProxy)})`,
      `  mail      via ${env.smtp.host}:${env.smtp.port} from ${env.mailFrom}`,
      `  database  ${where}`,
      `  workers   ${env.workers}; a crashed process is restarted`,
      '  first admin: npm run -s admin -- create --email you@lab.example --name "Your Name" --team "Your lab" (the password is asked for)',
    ];
  }
  return [
    `  demo lab  ${demoTeam.name}; every demo account's password is ${demoPassword}`,
    ...demoUsers.map((u) => `            ${u.email.padEnd(26)} ${u.role}${u.team === demoTeam.slug ? '' : ' (second team)'}`),
    `  mail      SMTP catcher on ${env.smtp.host}:${env.smtp.port}, messages in the app's Outbox`,
    `  database  ${where}`,
    `  workers   ${env.workers} (WORKERS=N npm start for more); a crashed process is restarted`,
  ];
}

/**
 * `npm start`: PostgreSQL, migrations, demo data, the web export, then the
 * mail catcher, API and workers as supervised child processes. `--dev`
 * replaces the export with Expo's hot-reloading dev server on :8081.
 *
 * With NODE_ENV=production it is how a lab runs Frostgrade on its own
 * server: it refuses to start without APP_ORIGIN and a real mail relay,
 * never adds the demo lab, runs no mail catcher, and keeps its private
 * cluster (if DATABASE_URL does not name another) under /var/lib with a
 * password. The first admin is made with `npm run admin -- create`.
 */
async function main(): Promise<void> {
  const dev = process.argv.includes('--dev');
  const production = process.env.NODE_ENV === 'production';
  if (production && dev) throw new Error('`npm run dev` is for development; run `NODE_ENV=production npm start` in production');
  const problems = production ? productionProblems(process.env) : [];
  if (problems.length > 0) throw new Error(`not starting in production:\n  - ${problems.join('\n  - ')}\nSee README, "Running it for a lab".`);
  const t0 = Date.now();
  const profile = production ? 'prod' : 'dev';
  const env = readEnv({ ...process.env, FROSTGRADE_PROFILE: profile });
  const root = join(__dirname, '..', '..');
  for (const port of env.mailCatcher ? [env.port, env.smtp.port] : [env.port]) {
    if (await portInUse(port)) throw new Error(`port ${port} is already in use: is another Frostgrade running? Stop it or set PORT / SMTP_PORT.`);
  }
  const db = await prepareDatabase(env, { fresh: false, seed: !production });
  if (!dev) ensureWebBuild(root, env.webDist);
  // The catcher stands in for a mail relay on a developer's machine only.
  const services: Service[] = stackServices(env.workers).filter((s) => s.name !== 'mail' || env.mailCatcher);
  if (dev) {
    services.push({ name: 'expo', entry: 'npx', args: ['expo', 'start', '--web', '--port', '8081'], env: { CI: '1', EXPO_OFFLINE: '1', EXPO_UNSTABLE_HEADLESS: '1', EXPO_PUBLIC_API_URL: env.appOrigin } });
  }
  // Children reach the database the way this process does (the private cluster's password included).
  const childEnv = { ...process.env, FROSTGRADE_PROFILE: profile, DATABASE_URL: db.url };
  let shuttingDown = false;
  const shutdown = async (code: number): Promise<void> => {
    if (shuttingDown) return;
    shuttingDown = true;
    log('frostgrade', 'stopping…');
    await stack.stop();
    if (db.cluster?.startedHere) stopCluster(db.cluster);
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
  const health = `${localOrigin(env)}/api/health`;
  try {
    await waitForHealth(health, 90);
  } catch (err) {
    // Answering but degraded (a mail relay away, no worker yet) deserves a warning, not a refusal; silence does not.
    const answering = await fetch(health).then(() => true, () => false);
    if (!answering) {
      log('frostgrade', `the API did not answer within 90 s; stopping. ${err instanceof Error ? err.message : String(err)}`);
      return shutdown(1);
    }
    log('frostgrade', `warning: started degraded; see ${health} from this machine. ${err instanceof Error ? err.message : String(err)}`);
  }
  const url = dev ? 'http://127.0.0.1:8081 (API at ' + env.appOrigin + ')' : env.appOrigin;
  log('frostgrade', [
    `ready in ${((Date.now() - t0) / 1000).toFixed(1)} s${production ? ' (production)' : ''}`,
    `  open      ${url}`,
    ...readyLines(env, db, production),
    '  Ctrl-C stops everything.',
  ].join('\n'));
}

main().catch((err: Error) => {
  console.error(`[frostgrade] ${err.message}`);
  process.exit(1);
});
