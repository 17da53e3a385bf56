import 'reflect-metadata';
import { createServer } from 'node:http';
import { createAuth } from './auth/auth-pool';
import { readEnv } from './config/env';
import { createDataSource } from './db/data-source';
import { createApp } from './http/app';
import { createMailer } from './mail/mailer';
import { installProcessGuards, whenDatabaseAnswers } from './ops/process-guards';
import { startBoss } from './queue/boss';
import type { RelayStatus } from './realtime/event-relay';
import { attachRealtime } from './realtime/socket-server';
import { watchRules } from './realtime/watch-rules';
import { startRunSweeper } from './runs/run-sweeper';
import { closeApiThreads } from './services/api-threads';
import { version } from './version';

/**
 * The API process: database, queue (supervising), mail, HTTP, sockets, and a
 * run sweeper. It outlives database restarts: pools reconnect on next use,
 * requests meanwhile answer 503, the event relay listens again by itself.
 */
async function main(): Promise<void> {
  installProcessGuards('api');
  const env = readEnv();
  const ds = await whenDatabaseAnswers('api', 'connecting', () => createDataSource(env.databaseUrl, 'frostgrade-api').initialize());
  const boss = await whenDatabaseAnswers('api', 'starting the queue', () => startBoss(env.databaseUrl, 'frostgrade-api', [env.runQueue]));
  const mailer = createMailer(env);
  const { auth, pool } = createAuth(env);
  // Known once the sockets are attached, which needs the HTTP server, which needs the app.
  let relay: () => RelayStatus = () => ({ listening: false, detail: 'not started yet' });
  const app = createApp({ env, ds, boss, mailer, auth, version, eventRelay: () => relay() });
  const server = createServer(app);
  // Node closes an idle keep-alive socket after 5 s; a client that reuses it at
  // that moment gets ECONNRESET. Idle sockets stay longer than the usual
  // client (and proxy) pools keep them, so the server is never the one to race.
  server.keepAliveTimeout = 65_000;
  server.headersTimeout = 66_000;
  const realtime = await attachRealtime(server, { auth, databaseUrl: env.databaseUrl, appOrigin: env.appOrigin, allowLoopback: !env.production }, watchRules(ds));
  relay = realtime.relay;
  const sweeper = startRunSweeper({ ds, boss }, env.runStaleSeconds, 'api');
  server.listen(env.port, env.host, () => console.log(`[api] listening on http://${env.host}:${env.port}`));
  let stopping = false;
  const stop = async (): Promise<void> => {
    if (stopping) return;
    stopping = true;
    sweeper.stop();
    await realtime.close();
    await boss.stop({ graceful: true, timeout: 5000 }).catch(() => undefined);
    mailer.close();
    await closeApiThreads().catch(() => undefined);
    await pool.end().catch(() => undefined);
    await ds.destroy().catch(() => undefined);
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop());
  process.on('SIGINT', () => void stop());
}

main().catch((err: Error) => {
  console.error(`[api] failed to start: ${err.message}`);
  process.exit(1);
});
