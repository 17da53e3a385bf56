import type PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import { traceShownMax, type CoolerRunDetail, type RunDetail, type RunProgress, type RunSummary, type Sweep as SweepDto, type SweepRequest, type TracePage } from '../../shared/api';
import type { MaterialInput } from '../../shared/engine';
import { designToCase, withSweepValue, type DesignParameters } from '../../shared/runs/design-case';
import { Design, MaterialFamilyVersion, Run, Sweep, Team } from '../db/entities';
import type { FairShare } from '../config/env';
import { HttpError, NotFoundError, RetryLaterError } from '../http/errors';
import { isUuid } from '../http/validate';
import { publishEvent } from '../db/events';
import { waitingOf, type WaitContext } from '../runs/queue-position';
import { sendRunJob } from '../runs/run-jobs';
import { cancelRunState } from '../runs/run-lifecycle';
import { version as appVersion } from '../version';
import { coolerSnapshotOf } from '../../shared/runs/cooler-results';
import { checkSweep, describe, findDesign } from './design-service';
import { summarise } from './run-summary';

export type RunDeps = { ds: DataSource; boss: PgBoss; runQueue: string; fair: FairShare; heartbeatSeconds: number };

const waitContext = (d: Pick<RunDeps, 'fair' | 'heartbeatSeconds'>): WaitContext => ({ fair: d.fair, heartbeatSeconds: d.heartbeatSeconds });

export async function findRun(m: EntityManager, team: Team, id: unknown): Promise<Run> {
  if (!isUuid(id)) throw new NotFoundError('run');
  const r = await m.getRepository(Run).findOneBy({ id, teamId: team.id });
  if (!r) throw new NotFoundError('run');
  return r;
}

/**
 * The team's next run number. The UPDATE locks the team's row until the
 * launch commits, so launches at the same moment queue here and each gets its
 * own number; a rolled-back launch gives its number back with it.
 */
async function nextRunNumber(m: EntityManager, teamId: string): Promise<number> {
  const rows = (await m.query('UPDATE team SET last_run_number = last_run_number + 1 WHERE id = $1 RETURNING last_run_number AS n', [teamId])) as [Array<{ n: number }>, number];
  return rows[0][0].n;
}

/** What a run computes: a design's leg (kind "leg") or a cooler (kind "couple" / "cascade"), frozen at launch. */
export type RunSource = Pick<Run, 'kind' | 'designId' | 'designSnapshot' | 'familyVersionId' | 'coolerId' | 'coolerSnapshot' | 'caseJson' | 'objective'>;

/** A leg run's source: the design with these parameters, its family version frozen. */
async function legSource(m: EntityManager, d: Design, params: DesignParameters): Promise<RunSource> {
  const version = await m.getRepository(MaterialFamilyVersion).findOneByOrFail({ familyId: d.familyId, version: d.familyVersion });
  const snapshot = { ...d, ...params };
  return {
    kind: 'leg', designId: d.id, designSnapshot: JSON.parse(JSON.stringify(snapshot)) as Record<string, unknown>, familyVersionId: version.id, coolerId: null, coolerSnapshot: null,
    caseJson: designToCase(params, version.definition as MaterialInput) as Record<string, unknown>, objective: d.objective,
  };
}

async function insertRun(m: EntityManager, teamId: string, source: RunSource, userId: string, queue: string, sweep?: { id: string; value: number }): Promise<Run> {
  const run = m.getRepository(Run).create({
    ...source, teamId, number: await nextRunNumber(m, teamId), sweepId: sweep?.id ?? null, sweepValue: sweep?.value ?? null,
    state: 'queued', queue, launchedBy: userId, engineVersion: appVersion,
  });
  return m.getRepository(Run).save(run);
}

/**
 * A team may launch `launchesPerMinute` runs a minute and hold
 * `unfinishedLimit` queued or running ones: enough for any real campaign,
 * not enough to bury the queue. Checked under a per-team lock, so two
 * launches at once cannot both slip under the limit.
 */
async function admitLaunch(m: EntityManager, team: Team, count: number, fair: FairShare): Promise<void> {
  await m.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`run-launch:${team.id}`]);
  const [{ recent }] = (await m.query(`SELECT count(*)::int AS recent FROM run WHERE team_id = $1 AND created_at > now() - interval '1 minute'`, [team.id])) as Array<{ recent: number }>;
  const [{ unfinished }] = (await m.query(`SELECT count(*)::int AS unfinished FROM run WHERE team_id = $1 AND state IN ('queued', 'running')`, [team.id])) as Array<{ unfinished: number }>;
  const what = count === 1 ? 'this run' : `these ${count} runs`;
  if (unfinished + count > fair.unfinishedLimit) {
    throw new RetryLaterError(429, `Your team has ${unfinished} runs queued or running; with ${what} that would pass its limit of ${fair.unfinishedLimit}. Wait for some to finish or cancel some.`, [{ field: 'runs', message: `at most ${fair.unfinishedLimit} unfinished runs per team` }], 60);
  }
  if (recent + count > fair.launchesPerMinute) {
    throw new RetryLaterError(429, `Your team launched ${recent} runs in the last minute; ${what} would pass its limit of ${fair.launchesPerMinute} a minute. Try again in a minute.`, [{ field: 'runs', message: `at most ${fair.launchesPerMinute} launches a minute per team` }], 60);
  }
}

/**
 * The one launch path of every kind of run: in one transaction, `prepare`
 * finds what is launched (404 for another team's), the team's limits admit
 * it, it gets its number and its job; then watchers hear of it.
 */
export async function launchOne(d: RunDeps, team: Team, user: { id: string; displayName: string }, prepare: (m: EntityManager) => Promise<RunSource>): Promise<RunSummary> {
  const run = await d.ds.transaction(async (m) => {
    const source = await prepare(m);
    await admitLaunch(m, team, 1, d.fair);
    const run = await insertRun(m, team.id, source, user.id, d.runQueue);
    await sendRunJob(m, d.boss, run);
    return run;
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'run:state', payload: { runId: run.id, state: 'queued' } });
  const waiting = await waitingOf(d.ds.manager, [run.id], waitContext(d));
  return summarise(run, user.displayName, waiting.get(run.id) ?? null);
}

export async function launchRun(d: RunDeps, team: Team, user: { id: string; displayName: string }, designId: unknown): Promise<RunSummary> {
  return launchOne(d, team, user, async (m) => {
    const design = await findDesign(m, team, designId);
    return legSource(m, design, design);
  });
}

export async function launchSweep(d: RunDeps, team: Team, user: { id: string; displayName: string }, designId: unknown, req: SweepRequest): Promise<SweepDto> {
  await checkSweep(d.ds, team, designId, req);
  const { sweep, runs, design } = await d.ds.transaction(async (m) => {
    const design = await findDesign(m, team, designId);
    await admitLaunch(m, team, req.values.length, d.fair);
    const sweep = await m.getRepository(Sweep).save(m.getRepository(Sweep).create({ teamId: team.id, designId: design.id, parameter: req.parameter, values: req.values, createdBy: user.displayName }));
    const runs: Run[] = [];
    for (const value of req.values) {
      const run = await insertRun(m, team.id, await legSource(m, design, withSweepValue(design, req.parameter, value)), user.id, d.runQueue, { id: sweep.id, value });
      await sendRunJob(m, d.boss, run);
      runs.push(run);
    }
    return { sweep, runs, design };
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'run:state', payload: { sweepId: sweep.id, state: 'queued' } });
  const waiting = await waitingOf(d.ds.manager, runs.map((r) => r.id), waitContext(d));
  return { id: sweep.id, designId: design.id, parameter: req.parameter as SweepDto['parameter'], values: sweep.values, createdAt: sweep.createdAt.toISOString(), runs: runs.map((r) => summarise(r, user.displayName, waiting.get(r.id) ?? null)) };
}

/**
 * A queued run is cancelled at once (keeping the best design of any earlier
 * attempt); a running one is asked to stop, and its worker keeps the best
 * design so far and marks it cancelled (run-lifecycle.ts).
 */
export async function cancelRun(d: RunDeps, team: Team, id: unknown): Promise<RunSummary> {
  const r = await findRun(d.ds.manager, team, id);
  const state = await cancelRunState(d, r.id);
  if (state === null) {
    const now = await findRun(d.ds.manager, team, r.id);
    throw new HttpError(409, `The run has already ${now.state}.`, [{ field: 'state', message: now.state }], 'Conflict');
  }
  const run = await findRun(d.ds.manager, team, r.id);
  const who = await names(d.ds.manager, [run.launchedBy]);
  return summarise(run, who.get(run.launchedBy) ?? 'a former member');
}

async function names(m: EntityManager, userIds: string[]): Promise<Map<string, string>> {
  if (userIds.length === 0) return new Map();
  const rows: Array<{ id: string; display_name: string }> = await m.query('SELECT id, display_name FROM app_user WHERE id = ANY($1)', [userIds]);
  return new Map(rows.map((r) => [r.id, r.display_name]));
}

/** The team's runs of every kind, newest first; `coolerId` lists a cooler's couple or cascade runs. */
export async function listRuns(d: Pick<RunDeps, 'ds' | 'fair' | 'heartbeatSeconds'>, team: Team, filter: { designId?: unknown; sweepId?: unknown; coolerId?: unknown }): Promise<RunSummary[]> {
  const { ds } = d;
  const qb = ds.getRepository(Run).createQueryBuilder('r').where('r.teamId = :team', { team: team.id }).orderBy('r.createdAt', 'DESC').take(200);
  if (filter.designId && isUuid(filter.designId)) qb.andWhere('r.designId = :d', { d: filter.designId });
  if (filter.sweepId && isUuid(filter.sweepId)) qb.andWhere('r.sweepId = :s', { s: filter.sweepId });
  if (filter.coolerId && isUuid(filter.coolerId)) qb.andWhere('r.coolerId = :c', { c: filter.coolerId });
  const runs = await qb.getMany();
  const who = await names(ds.manager, [...new Set(runs.map((r) => r.launchedBy))]);
  const waiting = await waitingOf(ds.manager, runs.filter((r) => r.state === 'queued').map((r) => r.id), waitContext(d));
  return runs.map((r) => summarise(r, who.get(r.launchedBy) ?? 'a former member', waiting.get(r.id) ?? null));
}

type TraceRow = { iteration: number; objective: number; best: number; seconds: number };

/** Evenly thinned to at most `max` points, first and last kept: enough to draw, however long the run. */
async function thinTrace(m: EntityManager, runId: string, max: number): Promise<{ points: TraceRow[]; total: number }> {
  const rows = (await m.query(
    `WITH t AS (SELECT iteration, objective, best, seconds, row_number() OVER (ORDER BY at, iteration) AS k, count(*) OVER () AS n FROM run_trace WHERE run_id = $1)
     SELECT iteration, objective, best, seconds, n::int AS n FROM t
     WHERE n <= $2 OR k = n OR (k - 1) % ceil(n::numeric / ($2 - 1))::int = 0 ORDER BY k`, [runId, max])) as Array<TraceRow & { n: number }>;
  return { points: rows.map(({ n: _n, ...p }) => p), total: rows[0]?.n ?? 0 };
}

/** The whole trace, page by page, oldest first. */
export async function tracePage(ds: DataSource, team: Team, id: unknown, q: { offset: number; limit: number }): Promise<TracePage> {
  const r = await findRun(ds.manager, team, id);
  const [{ total }] = (await ds.query('SELECT count(*)::int AS total FROM run_trace WHERE run_id = $1', [r.id])) as Array<{ total: number }>;
  const points = (await ds.query('SELECT iteration, objective, best, seconds FROM run_trace WHERE run_id = $1 ORDER BY at, iteration OFFSET $2 LIMIT $3', [r.id, q.offset, q.limit])) as TraceRow[];
  return { total, offset: q.offset, points };
}

/** A leg run answers runDetailSchema; a couple or cascade run coolerRunDetailSchema (told apart by `run.kind`). */
export async function runDetail(d: Pick<RunDeps, 'ds' | 'fair' | 'heartbeatSeconds'>, team: Team, id: unknown, userId: string): Promise<RunDetail | CoolerRunDetail> {
  return d.ds.transaction(async (m) => {
    const r = await findRun(m, team, id);
    const trace = await thinTrace(m, r.id, traceShownMax);
    const who = await names(m, [r.launchedBy]);
    const waiting = await waitingOf(m, [r.id], waitContext(d));
    const run = summarise(r, who.get(r.launchedBy) ?? 'a former member', waiting.get(r.id) ?? null);
    const progress = (r.progress as RunProgress | null) ?? null;
    if (r.kind !== 'leg') {
      // The frozen cooler, not the cooler as it is now: what was run is what is shown.
      const cooler = coolerSnapshotOf(r.coolerSnapshot);
      if (!cooler) throw new Error(`run ${r.id} has no readable cooler snapshot`);
      return { run, cooler, case: r.caseJson, progress, trace: trace.points, traceTotal: trace.total, result: r.result, engineVersion: r.engineVersion };
    }
    const design = await describe(m, await findDesign(m, team, r.designId), userId);
    const version = await m.getRepository(MaterialFamilyVersion).findOneByOrFail({ id: r.familyVersionId ?? undefined });
    // The frozen snapshot, not the design as it is now: what was run is what is shown.
    const snap = r.designSnapshot ?? {};
    return {
      run,
      design: { ...design, ...pick(snap, design), familyVersion: version.version },
      case: r.caseJson, familyVersion: version.version,
      progress,
      trace: trace.points, traceTotal: trace.total, result: r.result, engineVersion: r.engineVersion,
    };
  });
}

const endsBefore = { coldContactMicroOhmCm2: 0, hotContactMicroOhmCm2: 0, parasitic: 'none', parasiticLoadW: 0, emissivity: 0, surroundingsK: null };

function pick(snap: Record<string, unknown>, like: object): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const k of ['name', 'lengthMm', 'areaMm2', 'hotSide', 'objective', 'heatLoad', 'coldSide', 'minPerCm3', 'maxPerCm3', 'controlPoints', 'monotone', 'starts', 'minZoneMm']) {
    if (k in snap && k in like) out[k] = snap[k];
  }
  // A run frozen before designs had contacts ran with ideal ones and no parasitic heat, whatever the design says now.
  for (const [k, absent] of Object.entries(endsBefore)) out[k] = k in snap ? snap[k] : absent;
  return out;
}

export async function sweepDetail(d: Pick<RunDeps, 'ds' | 'fair' | 'heartbeatSeconds'>, team: Team, id: unknown): Promise<SweepDto> {
  const { ds } = d;
  if (!isUuid(id)) throw new NotFoundError('sweep');
  const s = await ds.getRepository(Sweep).findOneBy({ id, teamId: team.id });
  if (!s) throw new NotFoundError('sweep');
  const runs = await listRuns(d, team, { sweepId: s.id });
  return { id: s.id, designId: s.designId, parameter: s.parameter as SweepDto['parameter'], values: s.values, createdAt: s.createdAt.toISOString(), runs: runs.sort((a, b) => (a.sweepValue ?? 0) - (b.sweepValue ?? 0)) };
}
