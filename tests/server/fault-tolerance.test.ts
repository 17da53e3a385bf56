/**
 * Ordinary faults against a real `npm start`: PostgreSQL restarted, the
 * worker killed, the worker or the whole stack stopped mid-run. Each time
 * the service must stay up or come back by itself and the run must finish,
 * resumed from its checkpoint where its worker was lost.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Socket } from 'socket.io-client';
import { runDetailSchema, type RunDetail, type RunProgress } from '../../shared/api';
import { controlCluster } from '../../server/ops/postgres';
import { eventually } from './context';
import { freshDataRoot, npmStart, privateStack, signIn, socketOf, type NpmStart } from './npm-start';

const settings = privateStack('faults', 21, { RUN_STALE_SECONDS: '5' });
let stack: NpmStart;
let client: Awaited<ReturnType<typeof signIn>>;
let designId: string;
const sockets: Socket[] = [];
jest.setTimeout(900_000);

beforeAll(async () => {
  freshDataRoot(settings.pgDataRoot);
  stack = await npmStart(settings);
  client = await signIn(stack.origin, 'piet@northlight.example');
  const families = (await client.api<{ families: Array<{ id: string; name: string }> }>('GET', '/families')).body.families;
  const family = families.find((f) => f.name.startsWith('NL-P7 (Bi,Sb)'))!;
  // Starts take ~25 ms each on a quiet machine: a run of half a minute or more, checkpointed every 2 s.
  const d = await client.api<{ design: { id: string } }>('POST', '/designs', { name: 'Fault drill', familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 6, starts: 700 });
  designId = d.body.design.id;
});

afterAll(async () => {
  for (const s of sockets) s.disconnect();
  if (stack) {
    await stack.interrupt();
    // What the stack said, for whoever reads a failure: every process's log, in order.
    mkdirSync(join(__dirname, '..', '..', 'test-results'), { recursive: true });
    writeFileSync(join(__dirname, '..', '..', 'test-results', 'fault-tolerance-npm-start.log'), `${stack.output.join('\n')}\n`);
  }
});

const detail = async (runId: string): Promise<RunDetail> => runDetailSchema.parse((await client.api('GET', `/runs/${runId}`)).body);
const finished = (runId: string, seconds = 400) => eventually(async () => {
  const d = await detail(runId).catch(() => undefined);
  return d && ['succeeded', 'failed', 'cancelled'].includes(d.run.state) ? d : undefined;
}, seconds);
const startOf = (p: RunProgress): number => Number(/start (\d+) of/.exec(p.phase)?.[1] ?? 0);

async function launch(): Promise<string> {
  const res = await client.api<{ run: { id: string } }>('POST', `/designs/${designId}/runs`);
  expect(res.status).toBe(201);
  return res.body.run.id;
}

/** Waits until the run has a checkpoint past `starts` starts, held by a live worker. */
const checkpointed = (runId: string, starts: number) => eventually(async () => {
  const d = await detail(runId);
  return d.run.state === 'running' && d.progress && startOf(d.progress) > starts ? d : undefined;
}, 240);

it('PostgreSQL stopped and started under a running run: requests answer 503 meanwhile, nothing restarts, health is green again within 30 s and the run succeeds', async () => {
  const runId = await launch();
  const socket = await socketOf(stack.origin, client.cookie);
  sockets.push(socket);
  expect(await new Promise((r) => socket.emit('watch', `run:${runId}`, r))).toEqual({ ok: true });
  const events: Array<{ at: number; p: RunProgress }> = [];
  socket.on('run:progress', (p: RunProgress) => events.push({ at: Date.now(), p }));
  await checkpointed(runId, 20);
  const pidsBefore = [...stack.pidOf('server/main.ts'), ...stack.pidOf('worker/main.ts')];
  expect(pidsBefore).toHaveLength(2);

  controlCluster(stack.dataDir, 'stop');
  try {
    const health = await fetch(`${stack.origin}/api/health`);
    expect(health.status).toBe(503);
    const during = await client.api<{ name: string; message: string }>('GET', `/runs/${runId}`);
    expect(during.status).toBe(503);
    expect(during.body.message).toMatch(/database is unavailable/);
    await new Promise((r) => setTimeout(r, 5000));
  } finally {
    // Whatever failed above, the tests that follow need their database back.
    controlCluster(stack.dataDir, 'start');
  }
  const back = Date.now();

  await eventually(async () => ((await fetch(`${stack.origin}/api/health`)).status === 200 ? true : undefined), 30);
  // Live progress reaches the same socket again once the relay has listened again.
  await eventually(async () => (events.some((e) => e.at > back) ? true : undefined), 60);
  const done = await finished(runId);
  expect(done.run.state).toBe('succeeded');
  expect(done.run.attempts).toBe(1);
  expect([...stack.pidOf('server/main.ts'), ...stack.pidOf('worker/main.ts')].sort()).toEqual(pidsBefore.sort());
  expect(stack.output.some((l) => /unhandled|uncaught|restarting it/i.test(l))).toBe(false);
});

it('a worker killed with SIGKILL is restarted by the supervisor and the run resumes from its checkpoint (attempts = 2)', async () => {
  const runId = await launch();
  const before = await checkpointed(runId, 30);
  const [victim] = stack.pidOf('worker/main.ts');
  const from = stack.output.length;
  process.kill(victim!, 'SIGKILL');
  await stack.waitFor(/\[supervisor\] worker killed by SIGKILL.*restarting it/, 10, from);
  await stack.waitFor(/\[worker\] .* ready/, 60, from);
  const done = await finished(runId);
  expect(done.run.state).toBe('succeeded');
  expect(done.run.attempts).toBe(2);
  expect(stack.pidOf('worker/main.ts')).not.toContain(victim);
  // Resumed, not started over: the search did not go back to its first start.
  const resumedAt = stack.output.slice(from).some((l) => l.includes(`run ${runId} lost its worker`));
  expect(resumedAt).toBe(true);
  expect(startOf(before.progress!)).toBeGreaterThan(1);
});

it('SIGTERM to the worker mid-run hands the run back with a new job; the restarted worker finishes it', async () => {
  const runId = await launch();
  await checkpointed(runId, 20);
  const [worker] = stack.pidOf('worker/main.ts');
  const from = stack.output.length;
  process.kill(worker!, 'SIGTERM');
  await stack.waitFor(new RegExp(`run ${runId}: returned to the queue at shutdown`), 30, from);
  const done = await finished(runId);
  expect(done.run.state).toBe('succeeded');
  expect(done.run.attempts).toBe(1);
});

it('Ctrl-C of npm start mid-run, then npm start again: the run is queued with a live job and finishes', async () => {
  const runId = await launch();
  await checkpointed(runId, 20);
  const from = stack.output.length;
  // 130 is the conventional status of a program stopped by Ctrl-C (128 + SIGINT); tsx passes it on.
  expect([0, 130]).toContain(await stack.interrupt());
  expect(stack.output.slice(from)).toEqual(expect.arrayContaining([expect.stringContaining(`run ${runId}: returned to the queue at shutdown`), '[frostgrade] stopped']));
  stack = await npmStart(settings);
  client = await signIn(stack.origin, 'piet@northlight.example');
  const done = await finished(runId);
  expect(done.run.state).toBe('succeeded');
  expect(done.run.attempts).toBe(1);
});
