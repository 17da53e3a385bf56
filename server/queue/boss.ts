import PgBoss from 'pg-boss';
import { isDatabaseUnavailable } from '../db/db-errors';
import { queues } from './queues';

/** The schema pg-boss keeps its tables in; the run sweeper reads its job table. */
export const bossSchema = 'pgboss';

function isDeadlock(err: unknown): boolean {
  return typeof err === 'object' && err !== null && (err as { code?: string }).code === '40P01';
}

/** pg-boss reports every failed poll; while the database is away, once every 10 s is enough. */
function quietBossErrors(source: string): (err: Error) => void {
  let last = 0;
  return (err) => {
    if (isDatabaseUnavailable(err) && Date.now() - last < 10_000) return;
    last = Date.now();
    console.error(`[${source}] pg-boss: ${err.message}`);
  };
}

/**
 * pg-boss on the application database (schema `pgboss`). Every process that
 * starts it also supervises, so expired jobs are retried even when only one
 * kind of process is up. Processes starting together can deadlock on pg-boss's
 * own schema set-up; the set-up step runs it first, and a deadlock is retried.
 */
export async function startBoss(databaseUrl: string, applicationName: string, extraQueues: string[] = []): Promise<PgBoss> {
  for (let attempt = 1; ; attempt += 1) {
    const boss = new PgBoss({ connectionString: databaseUrl, schema: bossSchema, application_name: applicationName, max: 4 });
    boss.on('error', quietBossErrors(applicationName));
    try {
      await boss.start();
      for (const name of Object.values(queues)) {
        if (!(await boss.getQueue(name))) await boss.createQueue(name, { name, retryLimit: 1, expireInSeconds: 600 });
      }
      for (const name of extraQueues) await ensureRunQueue(boss, name);
      return boss;
    } catch (err) {
      await boss.stop({ graceful: false }).catch(() => undefined);
      if (!isDeadlock(err) || attempt >= 5) throw err;
      await new Promise((r) => setTimeout(r, 200 * attempt));
    }
  }
}

/**
 * Runs are supervised by Frostgrade itself (run heartbeats, checkpoints), not
 * by pg-boss retries: a retry by pg-boss could start a second copy of a run
 * that is still alive. So no retries, and an expiry far beyond any run.
 */
export async function ensureRunQueue(boss: PgBoss, name: string): Promise<void> {
  if (!(await boss.getQueue(name))) await boss.createQueue(name, { name, retryLimit: 0, expireInSeconds: 23 * 3600 });
}
