import { parentPort, Worker, workerData } from 'node:worker_threads';
import type { ThreadGate } from './thread-gate';

type Answer<T> = { ok: true; value: T } | { ok: false; message: string };

/** What one thread may take. Without limits a thread runs as long and as large as it likes (the worker's own jobs). */
export type ThreadLimits = {
  /** Wall-clock limit from the thread's start; past it the thread is terminated. */
  timeoutMs?: number;
  /** The thread's V8 heap (old generation), MB; past it the thread is stopped, never the calling process. */
  heapMb?: number;
  /** Concurrency cap the thread waits at before it starts. */
  gate?: ThreadGate;
  /** Called with each value the thread sends through `reportProgress` before its answer. */
  onProgress?: (fraction: number) => void;
};

type Progress = { progress: number };
const isProgress = (m: unknown): m is Progress => typeof (m as Progress | null)?.progress === 'number';

/** The thread was stopped at its time or memory limit. */
export class ThreadLimitError extends Error {
  constructor(
    readonly limit: 'time' | 'memory',
    message: string,
  ) {
    super(message);
    this.name = 'ThreadLimitError';
  }
}

const outOfMemory = (err: unknown): boolean => (err as { code?: unknown } | null)?.code === 'ERR_WORKER_OUT_OF_MEMORY';

/**
 * Runs a worker-thread entry file (one that calls `answerInThread`) with
 * `data` and resolves its answer, so seconds of engine work never stall the
 * calling process's event loop (an API answering others, a worker beating).
 * The thread loads TypeScript through tsx, as every Frostgrade process does.
 *
 * With limits: waits for a slot at `gate` (or is refused with
 * ThreadBusyError), and a thread that runs past `timeoutMs` or its heap of
 * `heapMb` is stopped and rejects with ThreadLimitError. The slot is given
 * back only once the thread has exited, so a stopped runaway still counts
 * until it is gone.
 */
export async function runInThread<T>(file: string, data: unknown, limits: ThreadLimits = {}): Promise<T> {
  const leave = limits.gate ? await limits.gate.enter() : () => undefined;
  let thread: Worker;
  try {
    const resourceLimits = limits.heapMb ? { maxOldGenerationSizeMb: limits.heapMb } : undefined;
    thread = new Worker(file, { execArgv: ['--require', 'tsx/cjs'], workerData: data, resourceLimits });
  } catch (err) {
    leave();
    throw err;
  }
  thread.once('exit', leave);
  return new Promise<T>((resolve, reject) => {
    let settled = false;
    const settle = (finish: () => void): void => {
      if (settled) return;
      settled = true;
      clearTimeout(timer);
      finish();
    };
    const timer = limits.timeoutMs === undefined ? undefined : setTimeout(() => {
      settle(() => reject(new ThreadLimitError('time', `the computation took longer than ${limits.timeoutMs! / 1000} s and was stopped`)));
      void thread.terminate();
    }, limits.timeoutMs);
    const onMessage = (m: Answer<T> | Progress): void => {
      if (isProgress(m)) { limits.onProgress?.(m.progress); return; }
      thread.off('message', onMessage);
      settle(() => (m.ok ? resolve(m.value) : reject(new Error(m.message))));
    };
    thread.on('message', onMessage);
    thread.once('error', (err) => settle(() => reject(outOfMemory(err) ? new ThreadLimitError('memory', `the computation needed more than ${limits.heapMb ?? 'the available'} MB of memory and was stopped`) : err)));
    thread.once('exit', (code) => settle(() => reject(new Error(`the thread stopped with exit code ${code}`))));
  });
}

/** The thread's side: compute from the data it was started with and post the value, or the error's message. */
export function answerInThread<D, T>(compute: (data: D) => T): void {
  let answer: Answer<T>;
  try {
    answer = { ok: true, value: compute(workerData as D) };
  } catch (err) {
    answer = { ok: false, message: err instanceof Error ? err.message : String(err) };
  }
  parentPort?.postMessage(answer);
}

/** The thread's side of `onProgress`: how far the computation has got (0…1). */
export function reportProgress(fraction: number): void {
  parentPort?.postMessage({ progress: fraction } satisfies Progress);
}
