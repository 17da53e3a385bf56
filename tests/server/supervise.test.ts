import { startServices, type Stack } from '../../server/ops/supervise';

/** The supervisor `npm start` uses (server/ops/supervise.ts), on tiny fixture services. */
jest.setTimeout(120_000);
const stacks: Stack[] = [];
afterAll(async () => { await Promise.all(stacks.map((s) => s.stop())); });

const fixture = 'tests/server/fixtures/exits-soon.ts';

it('restarts a child that dies, with growing delays, and gives up after repeated exits with the reason and its last output', async () => {
  const exits: Array<{ at: number; how: string }> = [];
  const delays: number[] = [];
  const given = await new Promise<{ name: string; reason: string }>((resolve) => {
    stacks.push(startServices([{ name: 'crasher', entry: fixture }], process.env, {
      maxExits: 3, windowMs: 60_000, firstDelayMs: 100,
      onExit: (_name, how) => exits.push({ at: Date.now(), how }),
      onRestart: (_name, delayMs) => delays.push(delayMs),
      onGiveUp: (name, reason) => resolve({ name, reason }),
    }));
  });
  // Started, then restarted three times (after 0.1, 0.2, 0.4 s), and the fourth exit within the window ends it.
  expect(exits.map((e) => e.how)).toEqual(Array(4).fill('exited with code 3'));
  expect(delays).toEqual([100, 200, 400]);
  // Each gap is the delay plus the child's own start-up (which a loaded machine stretches), so only the delay bounds it.
  const gaps = exits.slice(1).map((e, i) => e.at - exits[i]!.at);
  gaps.forEach((gap, i) => expect(gap).toBeGreaterThanOrEqual(delays[i]!));
  expect(given.name).toBe('crasher');
  expect(given.reason).toMatch(/^crasher stopped 4 times within 60 s \(last: exited with code 3\); not restarting it again/);
  expect(given.reason).toMatch(/\[fixture\] started pid \d+/);
});

it('restarts a child killed with SIGKILL and says so; stop() ends it for good', async () => {
  const exits: string[] = [];
  const stack = startServices([{ name: 'steady', entry: fixture, args: ['stay'] }], process.env, { firstDelayMs: 100, onExit: (_n, how) => exits.push(how) });
  stacks.push(stack);
  const first = await waitForPid(stack, 'steady');
  process.kill(first, 'SIGKILL');
  const second = await waitForPid(stack, 'steady', first);
  expect(second).not.toBe(first);
  expect(exits).toEqual(['killed by SIGKILL (out of memory, or killed by hand)']);
  await stack.stop();
  await new Promise((r) => setTimeout(r, 500));
  expect(stack.pid('steady')).toBeUndefined();
  expect(() => process.kill(second, 0)).toThrow();
});

async function waitForPid(stack: Stack, name: string, not?: number): Promise<number> {
  for (let i = 0; i < 200; i += 1) {
    const pid = stack.pid(name);
    if (pid && pid !== not) return pid;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`${name} did not (re)start`);
}
