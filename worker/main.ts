import 'reflect-metadata';
import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import { readEnv } from '../server/config/env';
import { createDataSource } from '../server/db/data-source';
import { startBoss } from '../server/queue/boss';
import { queues } from '../server/queue/queues';
import { startHeartbeat } from './heartbeat';

/**
 * A worker process. Start more of them (here or on other machines against the
 * same PostgreSQL) to work more jobs at once.
 */
async function main(): Promise<void> {
  const env = readEnv();
  const workerId = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-worker').initialize();
  const boss = await startBoss(env.databaseUrl, 'frostgrade-worker');
  const heartbeat = startHeartbeat(ds, workerId, env.heartbeatSeconds);
  await heartbeat.beat();
  await boss.work<{ sentAt?: string }>(queues.probe, { pollingIntervalSeconds: 0.5 }, async ([job]) => {
    await heartbeat.beat(1);
    return { workerId, receivedAt: new Date().toISOString(), sentAt: job?.data.sentAt ?? null };
  });
  console.log(`[worker] ${workerId} ready`);
  const stop = async (): Promise<void> => {
    heartbeat.stop();
    await boss.stop({ graceful: true, timeout: 10000 });
    await ds.destroy();
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop());
  process.on('SIGINT', () => void stop());
}

main().catch((err: Error) => {
  console.error(`[worker] failed to start: ${err.message}`);
  process.exit(1);
});
