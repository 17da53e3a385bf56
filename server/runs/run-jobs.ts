import type PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { bossSchema } from '../queue/boss';

/** pg-boss writes through the caller's transaction, so a run's state and its job change together or not at all. */
export function inTransaction(m: EntityManager): PgBoss.ConnectionOptions {
  return { db: { executeSql: async (text: string, values: unknown[]) => ({ rows: await m.query(text, values) }) } };
}

/** UPDATE … RETURNING comes back from TypeORM's postgres driver as [rows, count]. */
export function returned<T>(r: unknown): T[] {
  const list = r as unknown[];
  return (Array.isArray(list[0]) ? list[0] : list) as T[];
}

/**
 * A team's place in the line. pg-boss hands out jobs by priority (higher
 * first), then age. Giving each new job minus the number of runs its team
 * already has waiting or running puts every team's first run ahead of any
 * team's second, its second ahead of any third, and so on: a team that
 * launches a thousand runs does not make another team's one run wait behind
 * them all.
 */
async function teamPriority(m: EntityManager, runId: string): Promise<number> {
  const [row] = await m.query(
    `SELECT count(*)::int AS n FROM run o, run r
     WHERE r.id = $1 AND o.team_id = r.team_id AND o.queue = r.queue AND o.id <> r.id AND o.state IN ('queued', 'running')`, [runId]);
  return -Number((row as { n: number }).n);
}

/**
 * Puts a run (already `queued` in this transaction) on the queue with a fresh
 * job: after `delaySeconds`, at its team's priority. The job id is kept on
 * the run, where the sweeper checks that it is still alive.
 */
export async function sendRunJob(m: EntityManager, boss: PgBoss, run: { id: string; queue: string }, delaySeconds = 0): Promise<string> {
  const priority = await teamPriority(m, run.id);
  const jobId = await boss.send(run.queue, { runId: run.id }, { priority, ...(delaySeconds > 0 ? { startAfter: delaySeconds } : {}), ...inTransaction(m) });
  if (!jobId) throw new Error(`pg-boss did not create a job for run ${run.id}`);
  await m.query(
    `UPDATE run SET job_id = $2, queue_priority = $3, queued_at = now(), eligible_at = now() + make_interval(secs => $4) WHERE id = $1`,
    [run.id, jobId, priority, delaySeconds]);
  return jobId;
}

/** Retires a job that no longer stands for its run (the run was cancelled, or its worker is gone and a new job replaces it). */
export async function retireRunJob(m: EntityManager, boss: PgBoss, queue: string, jobId: string | null): Promise<void> {
  if (jobId) await boss.cancel(queue, jobId, inTransaction(m));
}

/**
 * SQL condition: run `r` has a job that will still start or is being started.
 * A job fetched by a worker that died before claiming the run stays `active`
 * in pg-boss for its whole expiry; past `staleSeconds` it no longer counts.
 */
export function liveJobCondition(staleSecondsParam: string): string {
  return `EXISTS (SELECT 1 FROM ${bossSchema}.job j WHERE j.name = r.queue AND j.id = r.job_id
    AND (j.state IN ('created', 'retry') OR (j.state = 'active' AND j.started_on > now() - make_interval(secs => ${staleSecondsParam}))))`;
}
