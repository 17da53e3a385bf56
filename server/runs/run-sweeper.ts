import { outageLog } from '../db/db-errors';
import { publishEvent } from '../db/events';
import { liveJobCondition, returned, retireRunJob, sendRunJob } from './run-jobs';
import type { RunLife } from './run-lifecycle';

export type SweepReport = { resumed: string[]; requeued: string[] };

/**
 * One pass that restores the invariant after whatever crashed: a running run
 * whose worker stopped beating goes back to the queue (its old job retired,
 * a new one made; it resumes from its checkpoint), and a queued run without
 * a live job gets one. An advisory lock lets one process sweep at a time.
 * `resumeStale` is false right after this process itself lost the database:
 * then every heartbeat looks old, though the workers are fine.
 */
export async function sweepRuns(life: RunLife, staleSeconds: number, resumeStale = true): Promise<SweepReport> {
  const report = await life.ds.transaction(async (m) => {
    const [{ locked }] = (await m.query(`SELECT pg_try_advisory_xact_lock(hashtext('frostgrade-run-sweeper')) AS locked`)) as Array<{ locked: boolean }>;
    if (!locked) return { resumed: [], requeued: [], teams: new Map<string, string>() };
    const teams = new Map<string, string>();
    const resumed: string[] = [];
    if (resumeStale) {
      const stale = returned<{ id: string; queue: string; team_id: string; job_id: string | null }>(await m.query(
        `UPDATE run r SET state = 'queued', worker_id = NULL, heartbeat_at = NULL, wait_reason = 'resumed'
         FROM (SELECT id, job_id AS old_job FROM run WHERE state = 'running' AND heartbeat_at < now() - make_interval(secs => $1) FOR UPDATE SKIP LOCKED) s
         WHERE r.id = s.id RETURNING r.id, r.queue, r.team_id, s.old_job AS job_id`, [staleSeconds]));
      for (const r of stale) {
        await retireRunJob(m, life.boss, r.queue, r.job_id);
        await sendRunJob(m, life.boss, r);
        resumed.push(r.id);
        teams.set(r.id, r.team_id);
      }
    }
    const orphans = (await m.query(
      `SELECT r.id, r.queue, r.team_id FROM run r
       WHERE r.state = 'queued' AND NOT r.cancel_requested AND r.queued_at < now() - make_interval(secs => $1) AND NOT ${liveJobCondition('$1')}
       FOR UPDATE SKIP LOCKED`, [staleSeconds])) as Array<{ id: string; queue: string; team_id: string }>;
    for (const r of orphans) {
      await sendRunJob(m, life.boss, r);
      teams.set(r.id, r.team_id);
    }
    return { resumed, requeued: orphans.map((r) => r.id), teams };
  });
  for (const id of report.resumed) console.log(`[runs] run ${id} lost its worker; queued again to resume from its checkpoint`);
  for (const id of report.requeued) console.log(`[runs] run ${id} was queued without a live job; a new job was made`);
  for (const [runId, teamId] of report.teams) {
    await publishEvent(life.ds, { teamId, room: `run:${runId}`, event: 'run:state', payload: { runId, state: 'queued', resumed: true } }).catch(() => undefined);
  }
  return { resumed: report.resumed, requeued: report.requeued };
}

/**
 * Sweeps every third of `staleSeconds` for as long as the process runs.
 * The API and every worker run one; the lock makes them take turns.
 */
export function startRunSweeper(life: RunLife, staleSeconds: number, source: string): { stop: () => void } {
  const outage = outageLog(source);
  let lastFailure = 0;
  let running = false;
  const tick = async (): Promise<void> => {
    if (running) return;
    running = true;
    try {
      // After our own outage, give workers one stale period to beat again before calling any of them gone.
      const settled = Date.now() - lastFailure > staleSeconds * 1000;
      await sweepRuns(life, staleSeconds, settled);
      outage.ok();
    } catch (err) {
      lastFailure = Date.now();
      outage.failed('run sweep', err);
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), Math.max(1000, (staleSeconds * 1000) / 3));
  return { stop: () => clearInterval(timer) };
}
