import { join } from 'node:path';
import { ThreadLimitError } from '../../server/threads/run-in-thread';
import { createThreadPool, type ThreadPool } from '../../server/threads/thread-pool';
import type { PoolTask } from './fixtures/pool-tasks';

/** The warm pool behind the API's request-path computations (server/services/api-threads.ts). */
jest.setTimeout(120_000);
const tasks = join(__dirname, 'fixtures', 'pool-tasks.ts');
let pool: ThreadPool;
beforeAll(() => { pool = createThreadPool({ maxThreads: 1, timeoutMs: 3000, heapMb: 48 }); });
afterAll(async () => { await pool.close(); });

const run = (task: PoolTask) => pool.run<{ value: number; threadId: number }>(tasks, task);

it('answers from a thread it keeps: the second request is served by the same thread', async () => {
  const first = await run({ kind: 'square', n: 12 });
  const second = await run({ kind: 'square', n: 5 });
  expect([first.value, second.value]).toEqual([144, 25]);
  expect(second.threadId).toBe(first.threadId);
  await expect(run({ kind: 'square', n: -3 })).rejects.toThrow('n must be at least 0, got -3');
});

it('stops an endless task at its time limit and answers the next one from a fresh thread', async () => {
  const before = await run({ kind: 'square', n: 2 });
  const err = await run({ kind: 'endless' }).catch((e: unknown) => e);
  expect(err).toBeInstanceOf(ThreadLimitError);
  expect(err).toMatchObject({ limit: 'time', message: 'the computation took longer than 3 s and was stopped' });
  const after = await run({ kind: 'square', n: 3 });
  expect(after.value).toBe(9);
  expect(after.threadId).not.toBe(before.threadId);
});

it('stops a task that outgrows its heap; the calling process and the pool live on', async () => {
  const err = await run({ kind: 'hog' }).catch((e: unknown) => e);
  expect(err).toBeInstanceOf(ThreadLimitError);
  expect(err).toMatchObject({ limit: 'memory', message: 'the computation needed more than 48 MB of memory and was stopped' });
  expect((await run({ kind: 'square', n: 4 })).value).toBe(16);
});
