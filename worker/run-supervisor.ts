import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { publishEvent } from '../server/realtime/events';

/**
 * Hands runs whose worker stopped beating (killed, machine lost) back to the
 * queue; the next worker resumes them from their last checkpoint. Every
 * worker runs this; an advisory lock lets one sweep at a time.
 */
export function startRunSupervisor(ds: DataSource, boss: PgBoss, staleSeconds: number): { stop: () => void } {
  const sweep = async (): Promise<void> => {
    await ds.transaction(async (m) => {
      const [{ locked }] = await m.query(`SELECT pg_try_advisory_xact_lock(hashtext('frostgrade-run-supervisor')) AS locked`);
      if (!locked) return;
      const [rows]: [Array<{ id: string; queue: string; team_id: string }>, number] = await m.query(
        `UPDATE run SET state = 'queued', worker_id = NULL, heartbeat_at = NULL
         WHERE state = 'running' AND heartbeat_at < now() - make_interval(secs => $1) RETURNING id, queue, team_id`, [staleSeconds]);
      for (const r of rows) {
        await boss.send(r.queue, { runId: r.id, resumed: true }, { db: { executeSql: async (text: string, values: unknown[]) => ({ rows: await m.query(text, values) }) } });
        console.log(`[worker] run ${r.id} lost its worker; queued again to resume from its checkpoint`);
        await publishEvent(ds, { teamId: r.team_id, room: `run:${r.id}`, event: 'run:state', payload: { runId: r.id, state: 'queued', resumed: true } });
      }
    });
  };
  const timer = setInterval(() => { sweep().catch((err: Error) => console.error(`[worker] supervisor: ${err.message}`)); }, Math.max(1000, (staleSeconds * 1000) / 3));
  return { stop: () => clearInterval(timer) };
}
