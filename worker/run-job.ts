import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { DataSource } from 'typeorm';
import type { RunProgress } from '../shared/api';
import type { SearchCheckpoint, SearchProgress } from '../shared/runs/global-search';
import type { Mailer } from '../server/mail/mailer';
import { publishEvent } from '../server/realtime/events';
import type { ThreadInput, ThreadMessage } from './engine-protocol';
import { mailRunFinished } from './run-mail';

export type RunJobDeps = { ds: DataSource; mailer: Mailer; appOrigin: string; workerId: string; isShuttingDown: () => boolean };

/** How often the worker writes progress, beats and saves checkpoints (ms). */
const PROGRESS_MS = 250;
const HEARTBEAT_MS = 1000;
const CHECKPOINT_MS = 2000;
/** A run whose worker vanished this many times is failed rather than retried for ever. */
export const MAX_ATTEMPTS = 4;

type Claimed = { id: string; team_id: string; design_id: string; design_snapshot: Record<string, unknown>; case_json: Record<string, unknown>; checkpoint: SearchCheckpoint | null; attempts: number; launched_by: string; started_at: Date };

/** Claims the run for this worker: only a queued run can be claimed, by one worker at a time. */
async function claim(ds: DataSource, runId: string, workerId: string): Promise<Claimed | null> {
  const rows: Claimed[] = await ds.query(
    `UPDATE run SET state = 'running', worker_id = $2, heartbeat_at = now(), attempts = attempts + 1, started_at = coalesce(started_at, now())
     WHERE id = $1 AND state = 'queued' AND NOT cancel_requested RETURNING *`, [runId, workerId]);
  // UPDATE … RETURNING comes back as [rows, count] from TypeORM's postgres driver.
  const list = Array.isArray(rows[0]) ? (rows[0] as unknown as Claimed[]) : rows;
  return list[0] ?? null;
}

/** Updates the run only while this worker still owns it; false means another worker took over. */
async function ownUpdate(ds: DataSource, runId: string, workerId: string, set: string, values: unknown[]): Promise<boolean> {
  const r: [unknown[], number] = await ds.query(`UPDATE run SET ${set} WHERE id = $1 AND worker_id = $2 AND state = 'running'`, [runId, workerId, ...values]);
  return r[1] > 0;
}

function toProgress(runId: string, p: SearchProgress, startedAt: number): RunProgress {
  const doping = p.state?.kind === 'doping' ? { x: p.state.perCm3.map((_, i, a) => i / (a.length - 1)), perCm3: p.state.perCm3 } : null;
  return {
    runId, phase: `${p.phase} · start ${p.start + 1} of ${p.starts}`, iteration: p.iteration, objective: p.objective, best: p.best,
    doping, current: p.state?.current ?? null, fractionDone: p.fractionDone, evaluations: p.evaluations,
    elapsedSeconds: (Date.now() - startedAt) / 1000, at: new Date().toISOString(),
  };
}

/**
 * Works one run: claim, optimise in a thread, stream progress, checkpoint,
 * honour cancellation, store the result, e-mail the followers. Returns what
 * happened, for the job's output.
 */
export async function runJob(d: RunJobDeps, runId: string): Promise<string> {
  const run = await claim(d.ds, runId, d.workerId);
  if (!run) return 'not claimable (cancelled, finished or running elsewhere)';
  const t0 = Date.now();
  const teamId = run.team_id;
  await publishEvent(d.ds, { teamId, event: 'run:state', payload: { runId, state: 'running' } });
  await publishEvent(d.ds, { teamId, room: `run:${runId}`, event: 'run:state', payload: { runId, state: 'running' } });
  if (run.attempts > MAX_ATTEMPTS) return finish(d, run, t0, { state: 'failed', error: `the run lost its worker ${run.attempts - 1} times; it may be too large for one worker's memory or time limit`, result: null });

  const stopFlag = new SharedArrayBuffer(4);
  const stop = new Int32Array(stopFlag);
  const input: ThreadInput = { case: run.case_json, starts: Number(run.design_snapshot.starts ?? 1), seed: runId, resume: run.checkpoint, stopFlag };
  const thread = new Worker(join(__dirname, 'engine-thread.ts'), { execArgv: ['--require', 'tsx/cjs'], workerData: input });

  let latest: RunProgress | null = null;
  let written: RunProgress | null = null;
  let checkpoint: SearchCheckpoint | null = null;
  let savedCheckpoint: SearchCheckpoint | null = run.checkpoint;
  let lost = false;
  let cancelled = false;

  const flushProgress = async (): Promise<void> => {
    if (!latest || latest === written) return;
    const p = latest;
    written = p;
    if (!(await ownUpdate(d.ds, runId, d.workerId, 'progress = $3', [JSON.stringify(p)]))) return;
    await d.ds.query('INSERT INTO run_trace (run_id, iteration, objective, best, seconds) VALUES ($1, $2, $3, $4, $5)', [runId, p.iteration, p.objective, p.best, p.elapsedSeconds]);
    await publishEvent(d.ds, { teamId, room: `run:${runId}`, event: 'run:progress', payload: p });
  };
  const beat = async (): Promise<void> => {
    const rows: Array<{ cancel_requested: boolean }> = await d.ds.query(
      `UPDATE run SET heartbeat_at = now() WHERE id = $1 AND worker_id = $2 AND state = 'running' RETURNING cancel_requested`, [runId, d.workerId]).then((r: unknown[]) => (Array.isArray(r[0]) ? r[0] as Array<{ cancel_requested: boolean }> : r as Array<{ cancel_requested: boolean }>));
    if (rows.length === 0) lost = true;
    cancelled = rows[0]?.cancel_requested ?? cancelled;
    if (lost || cancelled || d.isShuttingDown()) Atomics.store(stop, 0, 1);
  };
  const saveCheckpoint = async (): Promise<void> => {
    if (!checkpoint || checkpoint === savedCheckpoint) return;
    const cp = checkpoint;
    savedCheckpoint = cp;
    await ownUpdate(d.ds, runId, d.workerId, 'checkpoint = $3, checkpoint_at = now()', [JSON.stringify(cp)]);
  };
  const guard = (f: () => Promise<void>) => () => { f().catch((err: Error) => console.error(`[worker] run ${runId}: ${err.message}`)); };
  const timers = [setInterval(guard(flushProgress), PROGRESS_MS), setInterval(guard(beat), HEARTBEAT_MS), setInterval(guard(saveCheckpoint), CHECKPOINT_MS)];

  const outcome = await new Promise<ThreadMessage & { type: 'done' | 'error' }>((resolve) => {
    thread.on('message', (m: ThreadMessage) => {
      if (m.type === 'progress') latest = toProgress(runId, m.progress, t0);
      else if (m.type === 'checkpoint') checkpoint = m.checkpoint;
      else resolve(m);
    });
    thread.on('error', (err) => resolve({ type: 'error', message: `the engine thread crashed: ${err.message}` }));
    thread.on('exit', (code) => resolve({ type: 'error', message: `the engine thread exited with code ${code}` }));
  });
  timers.forEach(clearInterval);
  await thread.terminate();
  if (lost) return 'superseded by another worker; nothing written';
  await flushProgress();
  await saveCheckpoint();

  if (outcome.type === 'error') return finish(d, run, t0, { state: 'failed', error: outcome.field ? `the engine refused ${outcome.field}: ${outcome.message}` : outcome.message, result: null });
  if (outcome.stopped && !cancelled) {
    // Shutting down, not cancelled: hand the run back with its checkpoint for another worker.
    await ownUpdate(d.ds, runId, d.workerId, `state = 'queued', worker_id = NULL, heartbeat_at = NULL, attempts = attempts - 1`, []);
    return 'returned to the queue at shutdown';
  }
  const result = { ...outcome.result, search: { startsDone: outcome.startsDone, bestStart: outcome.bestStart, starts: input.starts } };
  return finish(d, run, t0, { state: cancelled ? 'cancelled' : 'succeeded', error: null, result });
}

async function finish(d: RunJobDeps, run: Claimed, t0: number, o: { state: 'succeeded' | 'failed' | 'cancelled'; error: string | null; result: Record<string, unknown> | null }): Promise<string> {
  const ok = await ownUpdate(d.ds, run.id, d.workerId, 'state = $3, error = $4, result = $5, finished_at = now(), heartbeat_at = NULL', [o.state, o.error, o.result === null ? null : JSON.stringify(o.result)]);
  if (!ok) return 'superseded by another worker; nothing written';
  const seconds = (Date.now() - t0) / 1000;
  const payload = { runId: run.id, state: o.state, error: o.error };
  await publishEvent(d.ds, { teamId: run.team_id, event: 'run:state', payload });
  await publishEvent(d.ds, { teamId: run.team_id, room: `run:${run.id}`, event: 'run:state', payload });
  await mailRunFinished(d.ds, d.mailer, d.appOrigin, {
    id: run.id, state: o.state, designId: run.design_id, designName: String(run.design_snapshot.name), launchedBy: run.launched_by, error: o.error, result: o.result, seconds,
  }).catch((err: Error) => console.error(`[worker] mail for run ${run.id} failed: ${err.message}`));
  return `${o.state} in ${seconds.toFixed(1)} s`;
}
