/**
 * The run queue as a shared resource: fair order and time slices between
 * teams, a per-team limit, launch limits, the sweeper that re-queues what a
 * crash stranded, cancels that race a claim, and bounded traces. Real
 * workers on private queues, real database.
 */
import { randomUUID } from 'node:crypto';
import { runDetailSchema, runSummarySchema, tracePageSchema, type RunDetail, type RunSummary } from '../../shared/api';
import { optimizeLeg, parseCase } from '../../shared/engine';
import { sweepRuns } from '../../server/runs/run-sweeper';
import { agent, demo, eventually, newTeam, openContext, signedIn, type TestContext } from './context';
import { spawnWorker, stopWorker, type SpawnedWorker } from './workers';

type Api = ReturnType<typeof agent>;
const contexts: TestContext[] = [];
const workers: SpawnedWorker[] = [];
jest.setTimeout(600_000);

afterAll(async () => {
  await Promise.all(workers.map(stopWorker));
  for (const c of contexts) await c.close();
});

/** An API wired to its own private queue (and fair-share settings), so only this test's workers take its runs. */
async function stackOn(fair: Partial<TestContext['env']['fairShare']> = {}): Promise<{ ctx: TestContext; queue: string }> {
  const queue = `test-queue-${randomUUID().slice(0, 8)}`;
  const base = await openContext({ runQueue: queue });
  await base.close();
  const ctx = await openContext({ runQueue: queue, fairShare: { ...base.env.fairShare, ...fair } });
  contexts.push(ctx);
  return { ctx, queue };
}

async function worker(queue: string, env: Record<string, string> = {}): Promise<SpawnedWorker> {
  const w = await spawnWorker(queue, 3, env);
  workers.push(w);
  return w;
}

const band = { kind: 'band', carrier: 'p', effectiveMass: 1.0, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1.0, latticeKappaExponent: -1 };

/** A design of the caller's team on a band family (made for the team when it has none by that name). */
async function design(api: Api, name: string, starts: number): Promise<string> {
  const families = (await api.get('/api/families')).body.families as Array<{ id: string; name: string }>;
  let family = families.find((f) => f.name === 'Queue test p-band');
  if (!family) {
    const made = await api.post('/api/families').send({ name: 'Queue test p-band', source: 'test: band model with round invented parameters', definition: band });
    family = made.body.family as { id: string; name: string };
  }
  const res = await api.post('/api/designs').send({ name, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 6, starts });
  expect(res.status).toBe(201);
  return res.body.design.id as string;
}

async function launch(api: Api, designId: string): Promise<RunSummary> {
  const res = await api.post(`/api/designs/${designId}/runs`);
  expect(res.status).toBe(201);
  return runSummarySchema.parse(res.body.run);
}

const detail = async (api: Api, id: string): Promise<RunDetail> => runDetailSchema.parse((await api.get(`/api/runs/${id}`)).body);
const finished = (api: Api, id: string, seconds = 300) => eventually(async () => {
  const d = await detail(api, id);
  return ['succeeded', 'failed', 'cancelled'].includes(d.run.state) ? d : undefined;
}, seconds);

it("another team's run does not wait behind a long run: it goes first in line and the long run yields its worker after its slice", async () => {
  const { ctx, queue } = await stackOn({ sliceSeconds: 2 });
  await worker(queue, { RUN_SLICE_SECONDS: '2' });
  const a = await signedIn(ctx, demo.physicist);
  const b = await signedIn(ctx, demo.otherTeamAdmin);
  const long = await launch(a, await design(a, `Long ${Date.now()}`, 2500));
  const shortA = await design(a, `Short A ${Date.now()}`, 2);
  const queuedA = [await launch(a, shortA), await launch(a, shortA), await launch(a, shortA)];
  await eventually(async () => ((await detail(a, long.id)).progress ? true : undefined), 60);
  // Launched while the long run may still have been waiting itself: read their places now that it runs.
  const places = await Promise.all(queuedA.map(async (r) => (await detail(a, r.id)).run.waiting?.position));
  expect(places).toEqual([1, 2, 3]);

  const other = await launch(b, await design(b, `Other team ${Date.now()}`, 2));
  // Every team's first waiting run goes before any team's second.
  expect(other.waiting).toEqual({ position: 1, reason: expect.stringMatching(/next in line/) });
  expect((await detail(a, queuedA[0]!.id)).run.waiting?.position).toBe(2);

  const yielded = await eventually(async () => {
    const d = await detail(a, long.id);
    return d.run.state === 'queued' ? d : undefined;
  }, 60);
  expect(yielded.run.waiting?.reason).toMatch(/gave its worker to another team's waiting run after its 2 s turn/);
  const otherDone = await finished(b, other.id, 120);
  expect(otherDone.run.state).toBe('succeeded');
  expect((await detail(a, long.id)).run.state).not.toBe('succeeded');
  const longDone = await finished(a, long.id, 400);
  expect(longDone.run.state).toBe('succeeded');
  // Yielding is not a lost attempt, and the search resumed rather than restarted: all its starts were done once.
  expect(longDone.run.attempts).toBe(1);
  expect((longDone.result as { search: { startsDone: number } }).search.startsDone).toBe(2500);
  for (const r of queuedA) expect((await finished(a, r.id)).run.state).toBe('succeeded');
});

it('a team over its running limit waits with the reason shown, while another team uses the free worker', async () => {
  const { ctx, queue } = await stackOn({ teamRunningLimit: 1 });
  await worker(queue, { TEAM_RUNNING_LIMIT: '1' });
  await worker(queue, { TEAM_RUNNING_LIMIT: '1' });
  const a = await signedIn(ctx, demo.physicist);
  const b = await signedIn(ctx, demo.otherTeamAdmin);
  const d = await design(a, `Limited ${Date.now()}`, 400);
  const first = await launch(a, d);
  const second = await launch(a, d);
  const waiting = await eventually(async () => {
    const one = await detail(a, first.id);
    const two = await detail(a, second.id);
    const queued = [one, two].find((x) => x.run.state === 'queued' && /already has 1 run running/.test(x.run.waiting?.reason ?? ''));
    return [one, two].some((x) => x.run.state === 'running') && queued ? queued : undefined;
  }, 60);
  expect(waiting.run.waiting?.reason).toMatch(/the most one team may run at once \(1\)/);
  const other = await launch(b, await design(b, `Beside ${Date.now()}`, 2));
  const otherDone = await finished(b, other.id, 60);
  expect(otherDone.run.state).toBe('succeeded');
  // The other team's run started while team A still had a run to go.
  const [{ unfinished }] = await ctx.ds.query(`SELECT count(*)::int AS unfinished FROM run WHERE id = ANY($1) AND (finished_at IS NULL OR finished_at > $2)`, [[first.id, second.id], otherDone.run.startedAt]);
  expect(unfinished).toBeGreaterThan(0);
  const running: Array<{ n: number }> = await ctx.ds.query(`SELECT count(*)::int AS n FROM run WHERE id = ANY($1) AND state = 'running'`, [[first.id, second.id]]);
  expect(running[0]!.n).toBeLessThanOrEqual(1);
  expect((await finished(a, first.id)).run.state).toBe('succeeded');
  expect((await finished(a, second.id)).run.state).toBe('succeeded');
});

it('launch limits answer 429 naming the limit, with Retry-After, and queue nothing', async () => {
  const { ctx } = await stackOn({ launchesPerMinute: 3, unfinishedLimit: 4 });
  // A new team of its own, so no other test's launches count against it.
  const { api: a } = await newTeam(ctx, { email: `limits-${randomUUID().slice(0, 8)}@example.test`, displayName: 'Lim', teamName: 'Limits lab' });
  const d = await design(a, `Rate ${Date.now()}`, 1);
  for (let i = 0; i < 3; i += 1) await launch(a, d);
  const refused = await a.post(`/api/designs/${d}/runs`);
  expect(refused.status).toBe(429);
  expect(refused.headers['retry-after']).toBe('60');
  expect(refused.body.errors).toEqual([{ field: 'runs', message: 'at most 3 launches a minute per team' }]);
  expect(refused.body.message).toMatch(/launched 3 runs in the last minute/);
  const sweep = await a.post(`/api/designs/${d}/sweeps`).send({ parameter: 'hotSide', values: [290, 300] });
  expect(sweep.status).toBe(429);
  expect(sweep.body.errors).toEqual([{ field: 'runs', message: 'at most 4 unfinished runs per team' }]);
  expect((await a.get(`/api/runs?designId=${d}`)).body.runs).toHaveLength(3);
});

it('the sweeper re-queues a queued run whose job was lost and a running run whose worker vanished; both then finish', async () => {
  const { ctx, queue } = await stackOn();
  const a = await signedIn(ctx, demo.physicist);
  const d = await design(a, `Stranded ${Date.now()}`, 2);
  const lostJob = await launch(a, d);
  const lostWorker = await launch(a, d);
  // What a crash between two writes would leave: a queued run with no job, a running run nobody works.
  await ctx.ds.query(`DELETE FROM pgboss.job WHERE name = $1 AND id = (SELECT job_id FROM run WHERE id = $2)`, [queue, lostJob.id]);
  await ctx.ds.query(`UPDATE run SET queued_at = now() - interval '1 minute' WHERE id = $1`, [lostJob.id]);
  await ctx.ds.query(`UPDATE run SET state = 'running', worker_id = 'gone:1:x', heartbeat_at = now() - interval '1 minute', attempts = 1 WHERE id = $1`, [lostWorker.id]);
  const report = await sweepRuns({ ds: ctx.ds, boss: ctx.boss }, 15);
  expect(report.requeued).toContain(lostJob.id);
  expect(report.resumed).toContain(lostWorker.id);
  const live: Array<{ id: string }> = await ctx.ds.query(
    `SELECT r.id FROM run r JOIN pgboss.job j ON j.name = r.queue AND j.id = r.job_id WHERE r.id = ANY($1) AND r.state = 'queued' AND j.state = 'created'`, [[lostJob.id, lostWorker.id]]);
  expect(live.map((r) => r.id).sort()).toEqual([lostJob.id, lostWorker.id].sort());
  // A second pass finds nothing left to repair: exactly one live job each.
  expect(await sweepRuns({ ds: ctx.ds, boss: ctx.boss }, 15)).toEqual({ resumed: [], requeued: [] });
  await worker(queue);
  expect((await finished(a, lostJob.id, 60)).run.state).toBe('succeeded');
  const resumed = await finished(a, lostWorker.id, 60);
  expect(resumed.run.state).toBe('succeeded');
  expect(resumed.run.attempts).toBe(2);
});

it('a cancel racing the claim ends cancelled, never failed; a queued run cancelled after an earlier attempt keeps that attempt\'s best design', async () => {
  const { ctx, queue } = await stackOn();
  await worker(queue);
  const a = await signedIn(ctx, demo.physicist);
  const d = await design(a, `Race ${Date.now()}`, 300);
  for (let i = 0; i < 4; i += 1) {
    const run = await launch(a, d);
    // No wait: the worker may not have claimed it yet, may be claiming it, or may have just begun.
    await new Promise((r) => setTimeout(r, i * 150));
    expect((await a.post(`/api/runs/${run.id}/cancel`)).status).toBe(200);
    const done = await finished(a, run.id, 60);
    expect(done.run.state).toBe('cancelled');
    expect(done.run.error).toBeNull();
  }

  const idle = await stackOn();
  const b = await signedIn(idle.ctx, demo.physicist);
  const queued = await launch(b, await design(b, `Checkpointed ${Date.now()}`, 50));
  const [{ case_json: caseJson }] = await idle.ctx.ds.query('SELECT case_json FROM run WHERE id = $1', [queued.id]);
  const best = optimizeLeg(parseCase(caseJson, 'optimize'));
  await idle.ctx.ds.query('UPDATE run SET checkpoint = $2 WHERE id = $1', [queued.id, JSON.stringify({ nextStart: 7, bestStart: 0, best })]);
  expect((await b.post(`/api/runs/${queued.id}/cancel`)).status).toBe(200);
  const kept = await detail(b, queued.id);
  expect(kept.run.state).toBe('cancelled');
  expect((kept.result as { objective: { value: number }; search: { startsDone: number } }).objective.value).toBeCloseTo(best.objective.value, 9);
  expect((kept.result as { search: { startsDone: number } }).search.startsDone).toBe(7);
  const [{ state }] = await idle.ctx.ds.query(`SELECT j.state FROM pgboss.job j JOIN run r ON j.name = r.queue AND j.id = r.job_id WHERE r.id = $1`, [queued.id]);
  expect(state).toBe('cancelled');
  void queue;
});

it('a run shows a thinned trace with its total, and the whole trace in bounded pages', async () => {
  const { ctx } = await stackOn();
  const a = await signedIn(ctx, demo.physicist);
  const run = await launch(a, await design(a, `Trace ${Date.now()}`, 1));
  await ctx.ds.query(
    `INSERT INTO run_trace (run_id, iteration, objective, best, seconds, at)
     SELECT $1, k, k * 0.01, k * 0.01, k * 0.25, now() + k * interval '1 millisecond' FROM generate_series(0, 4999) AS k`, [run.id]);
  const d = await detail(a, run.id);
  expect(d.traceTotal).toBe(5000);
  expect(d.trace.length).toBeLessThanOrEqual(400);
  expect(d.trace[0]!.iteration).toBe(0);
  expect(d.trace[d.trace.length - 1]!.iteration).toBe(4999);
  const page = tracePageSchema.parse((await a.get(`/api/runs/${run.id}/trace?offset=4500&limit=2000`)).body);
  expect(page.total).toBe(5000);
  expect(page.points.map((p) => p.iteration)).toEqual(Array.from({ length: 500 }, (_, i) => 4500 + i));
  const tooMany = await a.get(`/api/runs/${run.id}/trace?limit=5000`);
  expect(tooMany.status).toBe(400);
  expect(tooMany.body.errors[0]).toEqual({ field: 'limit', message: 'limit must be at most 2000' });
  expect((await (await signedIn(ctx, demo.otherTeamAdmin)).get(`/api/runs/${run.id}/trace`)).status).toBe(404);
});
