import { parentPort, Worker, workerData } from 'node:worker_threads';

type Answer<T> = { ok: true; value: T } | { ok: false; message: string };

/**
 * Runs a worker-thread entry file (one that calls `answerInThread`) with
 * `data` and resolves its answer, so seconds of engine work never stall the
 * calling process's event loop (an API answering others, a worker beating).
 * The thread loads TypeScript through tsx, as every Frostgrade process does.
 */
export function runInThread<T>(file: string, data: unknown): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const thread = new Worker(file, { execArgv: ['--require', 'tsx/cjs'], workerData: data });
    thread.once('message', (answer: Answer<T>) => (answer.ok ? resolve(answer.value) : reject(new Error(answer.message))));
    thread.once('error', reject);
    thread.once('exit', (code) => {
      if (code !== 0) reject(new Error(`the thread stopped with exit code ${code}`));
    });
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
