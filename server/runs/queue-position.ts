import type { EntityManager } from 'typeorm';
import type { RunWaiting } from '../../shared/api';
import type { FairShare } from '../config/env';

export type WaitContext = { fair: FairShare; heartbeatSeconds: number };

type Row = { id: string; ahead: number; wait_reason: string | null; team_running: number; workers: number };

const runs = (n: number): string => `${n} run${n === 1 ? '' : 's'}`;

function reasonFor(r: Row, c: WaitContext): string {
  if (r.workers === 0) return 'No worker is running: it starts as soon as one is.';
  if (r.wait_reason === 'team-limit' && r.team_running >= c.fair.teamRunningLimit) {
    return `Your team already has ${runs(r.team_running)} running, the most one team may run at once (${c.fair.teamRunningLimit}); it starts when one of them ends.`;
  }
  const line = r.ahead === 0 ? 'It is next in line for a free worker.' : `${runs(r.ahead)} ahead of it in the queue (each team's first waiting run goes before any team's second).`;
  if (r.wait_reason === 'yielded') return `It gave its worker to another team's waiting run after its ${c.fair.sliceSeconds} s turn and resumes from its checkpoint. ${line}`;
  if (r.wait_reason === 'resumed') return `Its worker stopped; it resumes from its last checkpoint. ${line}`;
  return line;
}

/**
 * Where each queued run stands and why it waits, in the order pg-boss hands
 * out jobs (priority, then age; see run-jobs.ts). Other teams' runs are
 * counted, never named.
 */
export async function waitingOf(m: EntityManager, ids: string[], c: WaitContext): Promise<Map<string, RunWaiting>> {
  if (ids.length === 0) return new Map();
  const rows = (await m.query(
    `SELECT r.id, r.wait_reason,
       (SELECT count(*) FROM run o WHERE o.queue = r.queue AND o.state = 'queued' AND NOT o.cancel_requested AND o.id <> r.id
          AND (o.queue_priority > r.queue_priority OR (o.queue_priority = r.queue_priority AND o.queued_at < r.queued_at)))::int AS ahead,
       (SELECT count(*) FROM run o WHERE o.team_id = r.team_id AND o.queue = r.queue AND o.state = 'running')::int AS team_running,
       (SELECT count(*) FROM worker_heartbeat h WHERE h.last_seen > now() - make_interval(secs => $2))::int AS workers
     FROM run r WHERE r.id = ANY($1) AND r.state = 'queued'`, [ids, 3 * c.heartbeatSeconds])) as Row[];
  return new Map(rows.map((r) => [r.id, { position: r.ahead + 1, reason: reasonFor(r, c) }]));
}
