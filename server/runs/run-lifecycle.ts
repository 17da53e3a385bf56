import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import type { RunProgress } from '../../shared/api';
import type { FairShare } from '../config/env';
import { publishEvent, type TeamEvent } from '../db/events';
import { returned, retireRunJob, sendRunJob } from './run-jobs';

/**
 * Every change of a run's state in the database, in one place. A run is
 * `queued` with exactly one live pg-boss job, or `running` on exactly one
 * live worker (worker_id, beating), or finished. Each step below keeps that
 * true on its own: a state change and the job that goes with it commit in
 * one transaction, and a worker only writes to a run it still holds. What a
 * crash leaves behind anyway (a worker gone mid-run, a job lost) is put right
 * by the sweeper (run-sweeper.ts).
 */
export type RunLife = { ds: DataSource; boss: PgBoss };

/**
 * Where a multi-start search stands after a start: every kind of run's search
 * checkpoints in this shape (global-search, couple-search, cascade-search),
 * with `best` that kind's result.
 */
export type RunCheckpoint = { nextStart: number; bestStart: number; best: object | null };

/** What a worker needs of the run it claimed: a leg run's design, or a couple or cascade run's cooler (snapshots as launched). */
export type ClaimedRun = {
  id: string; team_id: string; queue: string; number: number; kind: 'leg' | 'couple' | 'cascade';
  design_id: string | null; design_snapshot: Record<string, unknown> | null; cooler_snapshot: Record<string, unknown> | null; case_json: Record<string, unknown>;
  checkpoint: RunCheckpoint | null; attempts: number; launched_by: string;
};

export type ClaimOutcome = { kind: 'claimed'; run: ClaimedRun } | { kind: 'deferred'; reason: string } | { kind: 'gone'; reason: string };
export type Finish = { state: 'succeeded' | 'failed' | 'cancelled'; error: string | null; result: Record<string, unknown> | null };

/** A run over its team's limit is looked at again after this long. */
const deferSeconds = 5;

/** Browsers hear of a change when they can; a lost event never undoes a committed one (they refetch). */
async function announce(ds: DataSource, events: TeamEvent[]): Promise<void> {
  for (const e of events) {
    await publishEvent(ds, e).catch((err: Error) => console.error(`[runs] event ${e.event} not published: ${err.message}`));
  }
}

const stateEvents = (teamId: string, runId: string, payload: Record<string, unknown>): TeamEvent[] => [
  { teamId, event: 'run:state', payload: { runId, ...payload } },
  { teamId, room: `run:${runId}`, event: 'run:state', payload: { runId, ...payload } },
];

/**
 * A worker holding job `jobId` takes the run: only a queued, uncancelled run
 * whose current job this is, and only while its team is under its limit of
 * running runs (otherwise the run gets a later job and waits).
 */
export async function claimRun(life: RunLife, runId: string, jobId: string, workerId: string, fair: FairShare): Promise<ClaimOutcome> {
  const out = await life.ds.transaction(async (m): Promise<ClaimOutcome> => {
    const [run] = (await m.query('SELECT id, team_id, queue, state, cancel_requested, job_id FROM run WHERE id = $1 FOR UPDATE', [runId])) as Array<{ id: string; team_id: string; queue: string; state: string; cancel_requested: boolean; job_id: string | null }>;
    if (!run) return { kind: 'gone', reason: 'no such run' };
    if (run.state !== 'queued' || run.cancel_requested) return { kind: 'gone', reason: `the run is ${run.state}${run.cancel_requested ? ' (cancel requested)' : ''}` };
    if (run.job_id && run.job_id !== jobId) return { kind: 'gone', reason: 'another job stands for this run' };
    await m.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`run-team:${run.team_id}:${run.queue}`]);
    const [{ n }] = (await m.query(`SELECT count(*)::int AS n FROM run WHERE team_id = $1 AND queue = $2 AND state = 'running'`, [run.team_id, run.queue])) as Array<{ n: number }>;
    if (n >= fair.teamRunningLimit) {
      await m.query(`UPDATE run SET wait_reason = 'team-limit' WHERE id = $1`, [run.id]);
      await sendRunJob(m, life.boss, run, deferSeconds);
      return { kind: 'deferred', reason: `its team already has ${n} runs running (limit ${fair.teamRunningLimit})` };
    }
    const rows = returned<ClaimedRun>(await m.query(
      `UPDATE run SET state = 'running', worker_id = $2, job_id = $3, heartbeat_at = now(), attempts = attempts + 1,
         started_at = coalesce(started_at, now()), wait_reason = NULL
       WHERE id = $1 RETURNING id, team_id, queue, number, kind, design_id, design_snapshot, cooler_snapshot, case_json, checkpoint, attempts, launched_by`, [run.id, workerId, jobId]));
    return { kind: 'claimed', run: rows[0]! };
  });
  if (out.kind === 'claimed') await announce(life.ds, stateEvents(out.run.team_id, out.run.id, { state: 'running' }));
  return out;
}

/** Updates the run only while this worker still holds it; false means it was taken away (sweeper, cancel of a queued copy). */
async function whileHeld(ds: DataSource, runId: string, workerId: string, set: string, values: unknown[]): Promise<boolean> {
  const r = (await ds.query(`UPDATE run SET ${set} WHERE id = $1 AND worker_id = $2 AND state = 'running'`, [runId, workerId, ...values])) as [unknown[], number];
  return r[1] > 0;
}

/** The worker is alive and still holds the run; tells it whether a cancel was asked for. */
export async function beatRun(ds: DataSource, runId: string, workerId: string): Promise<{ held: boolean; cancelRequested: boolean }> {
  const rows = returned<{ cancel_requested: boolean }>(await ds.query(
    `UPDATE run SET heartbeat_at = now() WHERE id = $1 AND worker_id = $2 AND state = 'running' RETURNING cancel_requested`, [runId, workerId]));
  return { held: rows.length > 0, cancelRequested: rows[0]?.cancel_requested ?? false };
}

/** Latest progress, one trace point, and the live event for watchers. */
export async function recordProgress(ds: DataSource, run: { id: string; team_id: string }, workerId: string, p: RunProgress): Promise<void> {
  if (!(await whileHeld(ds, run.id, workerId, 'progress = $3', [JSON.stringify(p)]))) return;
  await ds.query('INSERT INTO run_trace (run_id, iteration, objective, best, seconds) VALUES ($1, $2, $3, $4, $5)', [run.id, p.iteration, p.objective, p.best, p.elapsedSeconds]);
  await publishEvent(ds, { teamId: run.team_id, room: `run:${run.id}`, event: 'run:progress', payload: p });
}

export async function saveCheckpoint(ds: DataSource, runId: string, workerId: string, cp: RunCheckpoint): Promise<void> {
  await whileHeld(ds, runId, workerId, 'checkpoint = $3, checkpoint_at = now()', [JSON.stringify(cp)]);
}

/** Stores how the run ended; false when this worker no longer held it (nothing written). */
export async function finishRun(ds: DataSource, run: { id: string; team_id: string }, workerId: string, o: Finish): Promise<boolean> {
  const ok = await whileHeld(ds, run.id, workerId, 'state = $3, error = $4, result = $5, finished_at = now(), heartbeat_at = NULL',
    [o.state, o.error, o.result === null ? null : JSON.stringify(o.result)]);
  if (ok) await announce(ds, stateEvents(run.team_id, run.id, { state: o.state, error: o.error }));
  return ok;
}

/**
 * The worker gives the run back, checkpoint kept, with a new job in the same
 * transaction: at shutdown ('resumed' elsewhere) or to let another team's
 * waiting run have the worker ('yielded'). Neither counts as a lost attempt.
 */
export async function requeueRun(life: RunLife, runId: string, workerId: string, reason: 'resumed' | 'yielded'): Promise<boolean> {
  const run = await life.ds.transaction(async (m) => {
    const rows = returned<{ id: string; queue: string; team_id: string }>(await m.query(
      `UPDATE run SET state = 'queued', worker_id = NULL, heartbeat_at = NULL, attempts = attempts - 1, wait_reason = $3
       WHERE id = $1 AND worker_id = $2 AND state = 'running' RETURNING id, queue, team_id`, [runId, workerId, reason]));
    const r = rows[0];
    if (r) await sendRunJob(m, life.boss, r);
    return r;
  });
  if (run) await announce(life.ds, stateEvents(run.team_id, run.id, { state: 'queued', resumed: true }));
  return run !== undefined;
}

/** The best design a checkpoint holds, as a run result. */
function resultOf(cp: RunCheckpoint | null, starts: unknown): Record<string, unknown> | null {
  if (!cp?.best) return null;
  return { ...cp.best, search: { startsDone: cp.nextStart, bestStart: cp.bestStart, starts: Number(starts ?? cp.nextStart) } };
}

/**
 * A queued run is cancelled at once (its job retired, the best design of any
 * earlier attempt kept); a running one is asked to stop, and its worker keeps
 * the best design so far. Returns the run's state afterwards, or null when it
 * had already finished.
 */
export async function cancelRunState(life: RunLife, runId: string): Promise<'cancelled' | 'running' | null> {
  const out = await life.ds.transaction(async (m) => {
    // Starts are frozen in the design snapshot (leg runs) or the cooler's input (couple and cascade runs).
    const [r] = (await m.query(`SELECT id, team_id, queue, state, job_id, checkpoint, coalesce(design_snapshot->'starts', cooler_snapshot->'input'->'starts') AS starts FROM run WHERE id = $1 FOR UPDATE`, [runId])) as Array<{ id: string; team_id: string; queue: string; state: string; job_id: string | null; checkpoint: RunCheckpoint | null; starts: unknown }>;
    if (!r) return null;
    if (r.state === 'queued') {
      await m.query(`UPDATE run SET state = 'cancelled', cancel_requested = true, finished_at = now(), wait_reason = NULL, result = $2 WHERE id = $1`,
        [r.id, JSON.stringify(resultOf(r.checkpoint, r.starts))]);
      await retireRunJob(m, life.boss, r.queue, r.job_id);
      return { state: 'cancelled' as const, teamId: r.team_id };
    }
    if (r.state === 'running') {
      await m.query('UPDATE run SET cancel_requested = true WHERE id = $1', [r.id]);
      return { state: 'running' as const, teamId: r.team_id };
    }
    return null;
  });
  if (!out) return null;
  await announce(life.ds, [{ teamId: out.teamId, event: 'run:cancel', payload: { runId } }, ...(out.state === 'cancelled' ? stateEvents(out.teamId, runId, { state: 'cancelled' }) : [])]);
  return out.state;
}

/**
 * Is a run of another team waiting for a worker of this queue — eligible for
 * a few seconds already, so no idle worker is about to take it — and under
 * its own team's limit? Then a run that has had its slice should yield.
 */
export async function otherTeamWaiting(ds: DataSource, run: { team_id: string; queue: string }, fair: FairShare): Promise<boolean> {
  const [row] = (await ds.query(
    `SELECT EXISTS (SELECT 1 FROM run w WHERE w.queue = $2 AND w.state = 'queued' AND w.team_id <> $1 AND NOT w.cancel_requested
       AND w.eligible_at < now() - interval '3 seconds'
       AND (SELECT count(*) FROM run o WHERE o.team_id = w.team_id AND o.queue = w.queue AND o.state = 'running') < $3) AS waiting`,
    [run.team_id, run.queue, fair.teamRunningLimit])) as Array<{ waiting: boolean }>;
  return row?.waiting ?? false;
}
