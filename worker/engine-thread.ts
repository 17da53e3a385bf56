/**
 * Runs one optimisation in a worker thread. The engine is synchronous and
 * CPU-bound; in its own thread it leaves the worker's event loop free for
 * heartbeats, database writes and cancellation. The stop flag is shared
 * memory: the main thread sets it and the engine sees it between iterations.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { CaseError, parseCascadeCase, parseCase, parseCoupleCase } from '../shared/engine';
import { cascadeSearch, type CascadeCheckpoint } from '../shared/runs/cascade-search';
import { coupleSearch, type CoupleCheckpoint } from '../shared/runs/couple-search';
import { globalSearch, SearchStoppedEarly, type SearchCheckpoint, type SearchProgress } from '../shared/runs/global-search';
import type { ThreadInput, ThreadMessage } from './engine-protocol';

const input = workerData as ThreadInput;
const stop = new Int32Array(input.stopFlag);
const post = (m: ThreadMessage): void => parentPort!.postMessage(m);

let lastPost = 0;
/** The options every kind of search takes (SearchOptionsOf in global-search.ts), but the checkpoint's type. */
const options = {
  starts: input.starts,
  seed: input.seed,
  shouldStop: () => Atomics.load(stop, 0) === 1,
  // The main thread throttles again; this only keeps the message queue short.
  onProgress: (p: SearchProgress) => {
    const now = Date.now();
    if (now - lastPost < 50) return;
    lastPost = now;
    post({ type: 'progress', progress: p });
  },
  onCheckpoint: (cp: SearchCheckpoint | CoupleCheckpoint | CascadeCheckpoint) => post({ type: 'checkpoint', checkpoint: cp }),
};

/** The run's kind picks the search; each checks its own case (a CaseError names the field). */
function search(): { result: object; stopped: boolean; startsDone: number; bestStart: number } {
  if (input.kind === 'couple') return coupleSearch(parseCoupleCase(input.case), { ...options, resume: input.resume as CoupleCheckpoint | null });
  if (input.kind === 'cascade') return cascadeSearch(parseCascadeCase(input.case), { ...options, resume: input.resume as CascadeCheckpoint | null });
  return globalSearch(parseCase(input.case, 'optimize'), { ...options, resume: input.resume as SearchCheckpoint | null });
}

try {
  const out = search();
  post({ type: 'done', result: out.result, stopped: out.stopped, startsDone: out.startsDone, bestStart: out.bestStart });
} catch (err) {
  // Stopped before the first start ended (a cancel or shutdown racing the claim): no design, not a failure.
  if (err instanceof SearchStoppedEarly) post({ type: 'done', result: null, stopped: true, startsDone: 0, bestStart: 0 });
  else post({ type: 'error', message: err instanceof Error ? err.message : String(err), field: err instanceof CaseError ? err.field : undefined });
}
