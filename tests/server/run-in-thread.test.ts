import { join } from 'node:path';
import { runInThread } from '../../server/threads/run-in-thread';

const square = join(__dirname, 'fixtures', 'square-thread.ts');

describe('runInThread', () => {
  it('answers with the thread’s value', async () => {
    await expect(runInThread<number>(square, 12)).resolves.toBe(144);
  });

  it('rejects with the thread’s own error message', async () => {
    await expect(runInThread<number>(square, -3)).rejects.toThrow('n must be at least 0, got -3');
  });

  it('rejects when the entry file cannot be loaded', async () => {
    await expect(runInThread<number>(join(__dirname, 'fixtures', 'no-such-thread.ts'), 1)).rejects.toThrow();
  });
});
