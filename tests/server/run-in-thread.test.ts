import { join } from 'node:path';
import { runInThread, ThreadLimitError } from '../../server/threads/run-in-thread';
import { ThreadBusyError, ThreadGate } from '../../server/threads/thread-gate';

const fixture = (name: string): string => join(__dirname, 'fixtures', `${name}-thread.ts`);
const square = fixture('square');

describe('runInThread', () => {
  it('answers with the thread’s value', async () => {
    await expect(runInThread<number>(square, 12)).resolves.toBe(144);
  });

  it('rejects with the thread’s own error message', async () => {
    await expect(runInThread<number>(square, -3)).rejects.toThrow('n must be at least 0, got -3');
  });

  it('rejects when the entry file cannot be loaded', async () => {
    await expect(runInThread<number>(fixture('no-such'), 1)).rejects.toThrow();
  });
});

describe('runInThread limits', () => {
  it('terminates an endless loop at its time limit with a clear error, and the caller carries on', async () => {
    const gate = new ThreadGate(1, 1);
    const err = await runInThread(fixture('endless'), null, { timeoutMs: 1500, gate }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ThreadLimitError);
    expect(err).toMatchObject({ limit: 'time', message: 'the computation took longer than 1.5 s and was stopped' });
    // The slot comes back once the stopped thread has exited; the next caller waits for it, then runs.
    await expect(runInThread<number>(square, 7, { timeoutMs: 20_000, gate })).resolves.toBe(49);
  });

  it('stops a thread that outgrows its heap with a clear error; the calling process lives on', async () => {
    const err = await runInThread(fixture('memory-hog'), null, { heapMb: 48, timeoutMs: 60_000 }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ThreadLimitError);
    expect(err).toMatchObject({ limit: 'memory', message: 'the computation needed more than 48 MB of memory and was stopped' });
    await expect(runInThread<number>(square, 5, { heapMb: 48 })).resolves.toBe(25);
  });

  it('runs at most maxRunning threads, queues maxWaiting more and refuses the rest as busy', async () => {
    const gate = new ThreadGate(1, 1, 7);
    const finished: number[] = [];
    const note = (ms: number): number => (finished.push(ms), ms);
    const first = runInThread<number>(fixture('sleep'), 1500, { gate }).then(note);
    const second = runInThread<number>(fixture('sleep'), 10, { gate }).then(note);
    const third = runInThread<number>(fixture('sleep'), 10, { gate }).catch((e: unknown) => e);
    expect(gate.load).toEqual({ running: 1, waiting: 1 });
    const refused = await third;
    expect(refused).toBeInstanceOf(ThreadBusyError);
    expect(refused).toMatchObject({ retryAfterSeconds: 7 });
    await Promise.all([first, second]);
    // Run side by side, the 10 ms thread would have finished first: it waited for the slot.
    expect(finished).toEqual([1500, 10]);
    await new Promise((r) => setTimeout(r, 200));
    expect(gate.load).toEqual({ running: 0, waiting: 0 });
  });
});
