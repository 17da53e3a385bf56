import { hostname } from 'node:os';
import type { DataSource } from 'typeorm';
import { outageLog } from '../server/db/db-errors';
import { WorkerHeartbeat } from '../server/db/entities';

/** Upserts this worker's row every few seconds; the API's health check reads it. */
export function startHeartbeat(ds: DataSource, workerId: string, everySeconds: number): { beat: (jobs?: number) => Promise<void>; stop: () => void } {
  const repo = ds.getRepository(WorkerHeartbeat);
  const startedAt = new Date();
  let jobsDone = 0;
  const beat = async (jobs = 0): Promise<void> => {
    jobsDone += jobs;
    await repo.upsert({ workerId, hostname: hostname(), pid: process.pid, startedAt, lastSeen: new Date(), jobsDone }, ['workerId']);
  };
  const outage = outageLog('worker');
  const timer = setInterval(() => {
    beat().then(() => outage.ok(), (err: unknown) => outage.failed('heartbeat', err));
  }, everySeconds * 1000);
  return { beat, stop: () => clearInterval(timer) };
}
