import { availableParallelism } from 'node:os';
import { BusyError, HttpError } from '../http/errors';
import { ThreadLimitError } from '../threads/run-in-thread';
import { ThreadBusyError, ThreadGate } from '../threads/thread-gate';
import { createThreadPool } from '../threads/thread-pool';

/**
 * Limits on the engine work the API does for one request (parsing an
 * uploaded table, checking a family with the engine, computing a module's
 * curves, predicting an as-grown leg). The work runs in worker threads so the
 * event loop keeps answering everyone else, and within bounds, so one caller
 * cannot take the API down:
 * - at most 2–4 threads at once (one per core, at least two so one long job
 *   does not hold up every other) and 8 callers waiting; beyond that 503;
 * - 20 s per thread: the largest table accepted is checked in about a second;
 * - 256 MB of heap per thread: the largest table accepted needs well under
 *   100 MB, and four full threads still fit beside the API.
 * The threads stay warm between requests (a minute idle ends one), so a small
 * request pays milliseconds, not a thread's start.
 */
export const apiThreadGate = new ThreadGate(Math.min(4, Math.max(2, availableParallelism())), 8, 5);
const apiThreads = createThreadPool({ maxThreads: apiThreadGate.maxRunning, timeoutMs: 20_000, heapMb: 256 });

/** Ends the API's threads (at shutdown, and when a test closes its app). */
export const closeApiThreads = (): Promise<void> => apiThreads.close();

/**
 * Runs the default export of `file` on `data` in an API thread: a full gate
 * answers 503 with Retry-After, a thread stopped at its time or memory limit
 * answers 422 naming `field` (what the caller sent that needed the work);
 * the thread's own errors pass through.
 */
export async function inApiThread<T>(file: string, data: unknown, field: string): Promise<T> {
  let leave: (() => void) | undefined;
  try {
    leave = await apiThreadGate.enter();
    return await apiThreads.run<T>(file, data);
  } catch (err) {
    if (err instanceof ThreadBusyError) {
      throw new BusyError(`The server is busy with other computations; try again in ${err.retryAfterSeconds} seconds.`, err.retryAfterSeconds);
    }
    if (err instanceof ThreadLimitError) {
      throw new HttpError(422, `Refused: ${err.message}.`, [{ field, message: err.message }], 'WorkLimit');
    }
    throw err;
  } finally {
    leave?.();
  }
}
