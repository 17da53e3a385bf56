import type PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import { traceShownMax, type RunDetail, type RunProgress, type RunSummary, type RunWaiting, type Sweep as SweepDto, type SweepRequest, type TracePage } from '../../shared/api';
import { bipolarOfProfile, type MaterialInput, type ProfileLike } from '../../shared/engine';
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
import { checkSweep, describe, findDesign } from './design-service';

export type RunDeps = { ds: DataSource; boss: PgBoss; runQueue: string; fair: FairShare; heartbeatSeconds: number };

const waitContext = (d: Pick<RunDeps, 'fair' | 'heartbeatSeconds'>): WaitContext => ({ fair: d.fair, heartbeatSeconds: d.heartbeatSeconds });

export async function findRun(m: EntityManager, team: Team, id: unknown): Promise<Run> {
  if (!isUuid(id)) throw new NotFoundError('run');
  const r = await m.getRepository(Run).findOneBy({ id, teamId: team.id });
  if (!r) throw new NotFoundError('run');
  return r;
}

export function summarise(r: Run, designName: string, launchedBy: string, waiting: RunWaiting | null = null): RunSummary {
  const p = r.progress as Partial<RunProgress> | null;
  const res = r.result as { objective?: { value: number }; deltaT?: number; profile?: ProfileLike } | null;
  return {
    id: r.id, number: r.number, kind: 'leg', designId: r.designId, coolerId: null, designName, sweepId: r.sweepId, sweepValue: r.sweepValue, state: r.state, objective: r.objective,
    best: res?.objective?.value ?? p?.best ?? null, deltaT: res?.deltaT ?? null,
    fractionDone: r.state === 'succeeded' ? 1 : p?.fractionDone ?? 0,
    starts: startsOf(r),
    launchedBy, createdAt: r.createdAt.toISOString(), startedAt: r.startedAt?.toISOString() ?? null, finishedAt: r.finishedAt?.toISOString() ?? null,
    error: r.error, attempts: r.attempts, waiting: r.state === 'queued' ? waiting : null,
    // One neutrality solve per profile point, and only for two-band families: cheap enough for every list.
    bipolar: bipolarOfProfile(r.caseJson.material as MaterialInput | undefined, res?.profile),
  };
}

/** The search starts the run was launched with (frozen in its design snapshot; runs from before starts were a setting made one). */
function startsOf(r: Run): number {
  const n = Number(r.designSnapshot.starts ?? 1);
  return Number.isInteger(n) && n >= 1 ? n : 1;
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

async function insertRun(m: EntityManager, d: Design, params: DesignParameters, userId: string, queue: string, sweep?: { id: string; value: number }): Promise<Run> {
  const version = await m.getRepository(MaterialFamilyVersion).findOneByOrFail({ familyId: d.familyId, version: d.familyVersion });
  const snapshot = { ...d, ...params };
  const run = m.getRepository(Run).create({
    teamId: d.teamId, number: await nextRunNumber(m, d.teamId), designId: d.id, designSnapshot: JSON.parse(JSON.stringify(snapshot)) as Record<string, unknown>, familyVersionId: version.id,
    sweepId: sweep?.id ?? null, sweepValue: sweep?.value ?? null,
    caseJson: designToCase(params, version.definition as MaterialInput) as Record<string, unknown>,
    objective: d.objective, state: 'queued', queue, launchedBy: userId, engineVersion: appVersion,
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

export async function launchRun(d: RunDeps, team: Team, user: { id: string; displayName: string }, designId: unknown): Promise<RunSummary> {
  const out = await d.ds.transaction(async (m) => {
    const design = await findDesign(m, team, designId);
    await admitLaunch(m, team, 1, d.fair);
    const run = await insertRun(m, design, design, user.id, d.runQueue);
    await sendRunJob(m, d.boss, run);
    return { run, design };
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'run:state', payload: { runId: out.run.id, state: 'queued' } });
  const waiting = await waitingOf(d.ds.manager, [out.run.id], waitContext(d));
  return summarise(out.run, out.design.name, user.displayName, waiting.get(out.run.id) ?? null);
}

export async function launchSweep(d: RunDeps, team: Team, user: { id: string; displayName: string }, designId: unknown, req: SweepRequest): Promise<SweepDto> {
  await checkSweep(d.ds, team, designId, req);
  const { sweep, runs, design } = await d.ds.transaction(async (m) => {
    const design = await findDesign(m, team, designId);
    await admitLaunch(m, team, req.values.length, d.fair);
    const sweep = await m.getRepository(Sweep).save(m.getRepository(Sweep).create({ teamId: team.id, designId: design.id, parameter: req.parameter, values: req.values, createdBy: user.displayName }));
    const runs: Run[] = [];
    for (const value of req.values) {
      const run = await insertRun(m, design, withSweepValue(design, req.parameter, value), user.id, d.runQueue, { id: sweep.id, value });
      await sendRunJob(m, d.boss, run);
      runs.push(run);
    }
    return { sweep, runs, design };
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'run:state', payload: { sweepId: sweep.id, state: 'queued' } });
  const waiting = await waitingOf(d.ds.manager, runs.map((r) => r.id), waitContext(d));
  return { id: sweep.id, designId: design.id, parameter: req.parameter as SweepDto['parameter'], values: sweep.values, createdAt: sweep.createdAt.toISOString(), runs: runs.map((r) => summarise(r, design.name, user.displayName, waiting.get(r.id) ?? null)) };
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
  return summarise(run, String(run.designSnapshot.name), who.get(run.launchedBy) ?? 'a former member');
}

async function names(m: EntityManager, userIds: string[]): Promise<Map<string, string>> {
  if (userIds.length === 0) return new Map();
  const rows: Array<{ id: string; display_name: string }> = await m.query('SELECT id, display_name FROM app_user WHERE id = ANY($1)', [userIds]);
  return new Map(rows.map((r) => [r.id, r.display_name]));
}

export async function listRuns(d: Pick<RunDeps, 'ds' | 'fair' | 'heartbeatSeconds'>, team: Team, filter: { designId?: string; sweepId?: string }): Promise<RunSummary[]> {
  const { ds } = d;
  const qb = ds.getRepository(Run).createQueryBuilder('r').where('r.teamId = :team', { team: team.id }).orderBy('r.createdAt', 'DESC').take(200);
  if (filter.designId && isUuid(filter.designId)) qb.andWhere('r.designId = :d', { d: filter.designId });
  if (filter.sweepId && isUuid(filter.sweepId)) qb.andWhere('r.sweepId = :s', { s: filter.sweepId });
  const runs = await qb.getMany();
  const who = await names(ds.manager, [...new Set(runs.map((r) => r.launchedBy))]);
  const waiting = await waitingOf(ds.manager, runs.filter((r) => r.state === 'queued').map((r) => r.id), waitContext(d));
  return runs.map((r) => summarise(r, String(r.designSnapshot.name), who.get(r.launchedBy) ?? 'a former member', waiting.get(r.id) ?? null));
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

export async function runDetail(d: Pick<RunDeps, 'ds' | 'fair' | 'heartbeatSeconds'>, team: Team, id: unknown, userId: string): Promise<RunDetail> {
  return d.ds.transaction(async (m) => {
    const r = await findRun(m, team, id);
    const design = await describe(m, await findDesign(m, team, r.designId), userId);
    const version = await m.getRepository(MaterialFamilyVersion).findOneByOrFail({ id: r.familyVersionId });
    const trace = await thinTrace(m, r.id, traceShownMax);
    const who = await names(m, [r.launchedBy]);
    const waiting = await waitingOf(m, [r.id], waitContext(d));
    // The frozen snapshot, not the design as it is now: what was run is what is shown.
    const snap = r.designSnapshot as Record<string, unknown>;
    return {
      run: summarise(r, String(snap.name), who.get(r.launchedBy) ?? 'a former member', waiting.get(r.id) ?? null),
      design: { ...design, ...pick(snap, design), familyVersion: version.version },
      case: r.caseJson, familyVersion: version.version,
      progress: (r.progress as RunProgress | null) ?? null,
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
