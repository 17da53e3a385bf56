import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { RunProgress } from '../shared/api';
import { runProgressOf } from '../shared/runs/run-progress';
import type { FairShare } from '../server/config/env';
import { isDatabaseUnavailable, outageLog } from '../server/db/db-errors';
import type { Mailer } from '../server/mail/mailer';
import { beatRun, claimRun, finishRun, otherTeamWaiting, recordProgress, requeueRun, saveCheckpoint, type ClaimedRun, type Finish, type RunCheckpoint, type RunLife } from '../server/runs/run-lifecycle';
import { frozenStarts } from '../server/runs/run-starts';
import type { ThreadInput, ThreadMessage } from './engine-protocol';
import { mailRunFinished } from './run-mail';

export type RunJobDeps = { life: RunLife; mailer: Mailer; appOrigin: string; workerId: string; fair: FairShare; isShuttingDown: () => boolean };

/** How often the worker writes progress, beats and saves checkpoints (ms). */
const PROGRESS_MS = 250;
const HEARTBEAT_MS = 1000;
const CHECKPOINT_MS = 2000;
/** How often, once its slice is used, a run asks whether another team is waiting (ms). */
const YIELD_CHECK_MS = 5000;
/** A run whose worker vanished this many times is failed rather than retried for ever. */
export const MAX_ATTEMPTS = 4;

/**
 * A write that must not be lost to a database restart (the final state, the
 * hand-back): retried with backoff while the database is unavailable, for up
 * to `giveUpMs`. If it still fails, the run's heartbeat goes stale and the
 * sweeper resumes it elsewhere from its last checkpoint.
 */
async function persist<T>(what: string, write: () => Promise<T>, giveUpMs = 10 * 60_000): Promise<T> {
  const t0 = Date.now();
  for (let delay = 250; ; delay = Math.min(5000, delay * 2)) {
    try {
      return await write();
    } catch (err) {
      if (!isDatabaseUnavailable(err)) throw err;
      if (Date.now() - t0 > giveUpMs) {
        console.error(`[worker] gave up storing the run's ${what} after ${Math.round(giveUpMs / 1000)} s without a database; the sweeper will resume the run from its last checkpoint`);
        throw err;
      }
      await new Promise((r) => setTimeout(r, delay));
    }
  }
}

/**
 * Works one run: claim, optimise in a thread, stream progress, checkpoint,
 * honour cancellation, yield to another team after a slice, store the
 * result, e-mail the followers. Returns what happened, for the job's output.
 */
export async function runJob(d: RunJobDeps, runId: string, jobId: string): Promise<string> {
  const claim = await claimRun(d.life, runId, jobId, d.workerId, d.fair);
  if (claim.kind !== 'claimed') return `${claim.kind}: ${claim.reason}`;
  const run = claim.run;
  const { ds } = d.life;
  const t0 = Date.now();
  if (run.attempts > MAX_ATTEMPTS) return end(d, run, t0, { state: 'failed', error: `the run lost its worker ${run.attempts - 1} times; it may be too large for one worker's memory or time limit`, result: null });

  const stop = new Int32Array(new SharedArrayBuffer(4));
  const starts = frozenStarts(run.kind, run.design_snapshot, run.cooler_snapshot);
  const input: ThreadInput = { kind: run.kind, case: run.case_json, starts, seed: runId, resume: run.checkpoint, stopFlag: stop.buffer as SharedArrayBuffer };
  const thread = new Worker(join(__dirname, 'engine-thread.ts'), { execArgv: ['--require', 'tsx/cjs'], workerData: input });

  let latest: RunProgress | null = null;
  let written: RunProgress | null = null;
  let checkpoint: RunCheckpoint | null = null;
  let savedCheckpoint: RunCheckpoint | null = run.checkpoint;
  let lost = false;
  let cancelled = false;
  let yielding = false;
  let wantYield = false;
  let lastYieldCheck = 0;
  const outage = outageLog('worker');

  const flushProgress = async (): Promise<void> => {
    if (!latest || latest === written) return;
    const p = latest;
    await recordProgress(ds, run, d.workerId, p);
    written = p;
  };
  const beat = async (): Promise<void> => {
    const b = await beatRun(ds, runId, d.workerId);
    lost = !b.held;
    cancelled = cancelled || b.cancelRequested;
    const sliceUsed = Date.now() - t0 > d.fair.sliceSeconds * 1000;
    if (sliceUsed && !wantYield && Date.now() - lastYieldCheck > YIELD_CHECK_MS) {
      lastYieldCheck = Date.now();
      wantYield = await otherTeamWaiting(ds, run, d.fair);
    }
    if (lost || cancelled || d.isShuttingDown()) Atomics.store(stop, 0, 1);
  };
  const checkpointNow = async (): Promise<void> => {
    if (!checkpoint || checkpoint === savedCheckpoint) return;
    const cp = checkpoint;
    await saveCheckpoint(ds, runId, d.workerId, cp);
    savedCheckpoint = cp;
  };
  const guard = (what: string, f: () => Promise<void>) => () => { f().then(() => outage.ok(), (err: unknown) => outage.failed(`run ${runId}: ${what}`, err)); };
  const timers = [setInterval(guard('progress', flushProgress), PROGRESS_MS), setInterval(guard('heartbeat', beat), HEARTBEAT_MS), setInterval(guard('checkpoint', checkpointNow), CHECKPOINT_MS)];

  const outcome = await new Promise<ThreadMessage & { type: 'done' | 'error' }>((resolve) => {
    thread.on('message', (m: ThreadMessage) => {
      if (m.type === 'progress') latest = runProgressOf(runId, m.progress, (Date.now() - t0) / 1000, new Date());
      else if (m.type === 'checkpoint') {
        checkpoint = m.checkpoint;
        // Yield only at a start boundary, so the hand-over loses at most the start just begun.
        if (wantYield && m.checkpoint.nextStart < starts) { yielding = true; Atomics.store(stop, 0, 1); }
      } else resolve(m);
    });
    thread.on('error', (err) => resolve({ type: 'error', message: `the engine thread crashed: ${err.message}` }));
    thread.on('exit', (code) => resolve({ type: 'error', message: `the engine thread exited with code ${code}` }));
  });
  await thread.terminate();
  // The heartbeat goes on until the run's last write is stored: a slow database must not make it look abandoned.
  const [progressTimer, beatTimer, checkpointTimer] = timers;
  clearInterval(progressTimer);
  clearInterval(checkpointTimer);
  try {
    if (lost) return 'superseded by another worker; nothing written';
    await persist('progress', flushProgress).catch(() => undefined);
    await persist('checkpoint', checkpointNow).catch(() => undefined);

    if (outcome.type === 'error') return await end(d, run, t0, { state: 'failed', error: outcome.field ? `the engine refused ${outcome.field}: ${outcome.message}` : outcome.message, result: null });
    if (outcome.stopped && !cancelled) {
      // Shutting down or yielding, not cancelled: back to the queue with its checkpoint, in one transaction with its new job.
      const reason = yielding && !d.isShuttingDown() ? 'yielded' : 'resumed';
      const ok = await persist('hand-back', () => requeueRun(d.life, runId, d.workerId, reason));
      return ok ? (reason === 'yielded' ? 'yielded its worker to another team; queued again' : 'returned to the queue at shutdown') : 'superseded by another worker; nothing written';
    }
    const result = outcome.result ? { ...outcome.result, search: { startsDone: outcome.startsDone, bestStart: outcome.bestStart, starts } } : null;
    return await end(d, run, t0, { state: cancelled ? 'cancelled' : 'succeeded', error: null, result });
  } finally {
    clearInterval(beatTimer);
  }
}

async function end(d: RunJobDeps, run: ClaimedRun, t0: number, o: Finish): Promise<string> {
  const ok = await persist('result', () => finishRun(d.life.ds, run, d.workerId, o));
  if (!ok) return 'superseded by another worker; nothing written';
  const seconds = (Date.now() - t0) / 1000;
  await mailRunFinished(d.life.ds, d.mailer, d.appOrigin, {
    id: run.id, number: run.number, kind: run.kind, state: o.state, designId: run.design_id,
    designName: String((run.kind === 'leg' ? run.design_snapshot : run.cooler_snapshot)?.name ?? ''), launchedBy: run.launched_by, error: o.error, result: o.result, seconds,
  }).catch((err: Error) => console.error(`[worker] mail for run ${run.id} failed: ${err.message}`));
  return `${o.state} in ${seconds.toFixed(1)} s`;
}
