import 'reflect-metadata';
import { createAuth } from './auth/auth-pool';
import { readEnv } from './config/env';
import { createDataSource } from './db/data-source';
import { createServer } from 'node:http';
import { createApp } from './http/app';
import { attachRealtime } from './realtime/socket-server';
import { watchRules } from './realtime/watch-rules';
import { createMailer } from './mail/mailer';
import { startBoss } from './queue/boss';
import { version } from './version';

/** The API process: database, queue (supervising), mail, HTTP. */
async function main(): Promise<void> {
  const env = readEnv();
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-api').initialize();
  const boss = await startBoss(env.databaseUrl, 'frostgrade-api', [env.runQueue]);
  const mailer = createMailer(env);
  const { auth, pool } = createAuth(env);
  const app = createApp({ env, ds, boss, mailer, auth, version });
  const server = createServer(app);
  // Node closes an idle keep-alive socket after 5 s; a client that reuses it at
  // that moment gets ECONNRESET. Idle sockets stay longer than the usual
  // client (and proxy) pools keep them, so the server is never the one to race.
  server.keepAliveTimeout = 65_000;
  server.headersTimeout = 66_000;
  const realtime = await attachRealtime(server, { auth, databaseUrl: env.databaseUrl, appOrigin: env.appOrigin, allowLoopback: !env.production }, watchRules(ds));
  server.listen(env.port, env.host, () => console.log(`[api] listening on http://${env.host}:${env.port}`));
  let stopping = false;
  const stop = async (): Promise<void> => {
    if (stopping) return;
    stopping = true;
    await realtime.close();
    await boss.stop({ graceful: true, timeout: 5000 });
    mailer.close();
    await pool.end();
    await ds.destroy();
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop());
  process.on('SIGINT', () => void stop());
}

main().catch((err: Error) => {
  console.error(`[api] failed to start: ${err.message}`);
  process.exit(1);
});
