import 'reflect-metadata';
import { randomUUID } from 'node:crypto';
import { hostname } from 'node:os';
import { readEnv } from '../server/config/env';
import { createDataSource } from '../server/db/data-source';
import { createMailer } from '../server/mail/mailer';
import { installProcessGuards, whenDatabaseAnswers } from '../server/ops/process-guards';
import { startBoss } from '../server/queue/boss';
import { queues } from '../server/queue/queues';
import { startRunSweeper } from '../server/runs/run-sweeper';
import { accountMailJob } from './account-mail-job';
import { growthMailJob } from './growth-mail-job';
import { startHeartbeat } from './heartbeat';
import { runJob } from './run-job';
import { sheetJob, type SheetJobData } from './sheet-job';

/**
 * A worker process: one run at a time (a run keeps one core busy). Start
 * more of them, here or on other machines against the same PostgreSQL, to
 * work more runs at once. It survives database restarts: every write it owes
 * a run is retried until PostgreSQL is back, and pg-boss polls again by itself.
 */
async function main(): Promise<void> {
  installProcessGuards('worker');
  const env = readEnv();
  const workerId = `${hostname()}:${process.pid}:${randomUUID().slice(0, 8)}`;
  const ds = await whenDatabaseAnswers('worker', 'connecting', () => createDataSource(env.databaseUrl, 'frostgrade-worker').initialize());
  const boss = await whenDatabaseAnswers('worker', 'starting the queue', () => startBoss(env.databaseUrl, 'frostgrade-worker', [env.runQueue]));
  const mailer = createMailer(env);
  const life = { ds, boss };
  const heartbeat = startHeartbeat(ds, workerId, env.heartbeatSeconds);
  await heartbeat.beat();
  let shuttingDown = false;
  await boss.work<{ sentAt?: string }>(queues.probe, { pollingIntervalSeconds: 0.5 }, async ([job]) => {
    await heartbeat.beat(1);
    return { workerId, receivedAt: new Date().toISOString(), sentAt: job?.data.sentAt ?? null };
  });
  await boss.work<{ runId: string }>(env.runQueue, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => {
    if (!job) return null;
    const outcome = await runJob({ life, mailer, appOrigin: env.appOrigin, workerId, fair: env.fairShare, isShuttingDown: () => shuttingDown }, job.data.runId, job.id);
    await heartbeat.beat(1).catch(() => undefined);
    console.log(`[worker] run ${job.data.runId}: ${outcome}`);
    return { workerId, outcome };
  });
  await boss.work<SheetJobData>(queues.growthSheet, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => {
    if (!job) return null;
    const outcome = await sheetJob(ds, boss, job.data);
    console.log(`[worker] growth order ${job.data.orderId}: ${outcome}`);
    return { workerId, outcome };
  });
  await boss.work(queues.accountMail, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => {
    if (!job) return null;
    // The job's data names addresses; the log says only what kind went out.
    const outcome = await accountMailJob({ ds, mailer, appOrigin: env.appOrigin }, job.data);
    console.log(`[worker] account mail ${job.id}: ${outcome}`);
    return { workerId, outcome };
  });
  await boss.work(queues.growthMail, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => {
    if (!job) return null;
    const outcome = await growthMailJob({ ds, mailer, appOrigin: env.appOrigin }, job.data);
    console.log(`[worker] growth mail ${job.id}: ${outcome}`);
    return { workerId, outcome };
  });
  const sweeper = startRunSweeper(life, env.runStaleSeconds, 'worker');
  console.log(`[worker] ${workerId} ready (queue ${env.runQueue})`);
  const stop = async (): Promise<void> => {
    if (shuttingDown) return;
    shuttingDown = true;
    sweeper.stop();
    heartbeat.stop();
    // A running job sees `shuttingDown` at its next beat, checkpoints, and hands its run back with a new job.
    await boss.stop({ graceful: true, timeout: 15000, wait: true }).catch((err: Error) => console.error(`[worker] queue stop: ${err.message}`));
    mailer.close();
    await ds.destroy().catch(() => undefined);
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop());
  process.on('SIGINT', () => void stop());
}

main().catch((err: Error) => {
  console.error(`[worker] failed to start: ${err.message}`);
  process.exit(1);
});
