import Piscina from 'piscina';
import { ThreadLimitError } from './run-in-thread';

export type PoolLimits = {
  /** Threads at most (and kept warm while work comes). */
  maxThreads: number;
  /** Wall-clock limit of one task; past it its thread is terminated and replaced. */
  timeoutMs: number;
  /** Each thread's V8 heap (old generation), MB; a task that needs more stops its thread, never the process. */
  heapMb: number;
  /** A thread idle this long is ended (its memory given back). */
  idleMs?: number;
};

export type ThreadPool = { run: <T>(file: string, data: unknown) => Promise<T>; close: () => Promise<void> };

const outOfMemory = (err: unknown): boolean => (err as { code?: unknown } | null)?.code === 'ERR_WORKER_OUT_OF_MEMORY';
const aborted = (err: unknown): boolean => (err as { name?: unknown } | null)?.name === 'AbortError';

/**
 * Warm worker threads (piscina) for work the API does on a request. A thread
 * that loads TypeScript takes 0.3–0.6 s to start: started once and reused,
 * a small table's preview answers in milliseconds instead. Each task runs
 * the default export of its entry file (absolute path) on `data`, under a
 * time limit and a heap limit per thread; either stops the thread (piscina
 * starts a fresh one) and rejects with ThreadLimitError. How many callers may
 * wait is the caller's business (ThreadGate): the pool's own queue is not
 * bounded here.
 */
export function createThreadPool(l: PoolLimits): ThreadPool {
  const pool = new Piscina({
    maxThreads: l.maxThreads,
    minThreads: 0,
    idleTimeout: l.idleMs ?? 60_000,
    // Every Frostgrade process loads its TypeScript through tsx; threads too.
    execArgv: ['--import', 'tsx'],
    resourceLimits: { maxOldGenerationSizeMb: l.heapMb },
  });
  return {
    run: async <T>(file: string, data: unknown): Promise<T> => {
      try {
        return (await pool.run(data, { filename: file, signal: AbortSignal.timeout(l.timeoutMs) })) as T;
      } catch (err) {
        if (aborted(err)) throw new ThreadLimitError('time', `the computation took longer than ${l.timeoutMs / 1000} s and was stopped`);
        if (outOfMemory(err)) throw new ThreadLimitError('memory', `the computation needed more than ${l.heapMb} MB of memory and was stopped`);
        throw err;
      }
    },
    close: () => pool.destroy(),
  };
}
