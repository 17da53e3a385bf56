import type PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import type { RunDetail, RunProgress, RunSummary, Sweep as SweepDto, SweepRequest } from '../../shared/api';
import type { MaterialInput } from '../../shared/engine';
import { designToCase, withSweepValue, type DesignParameters } from '../../shared/runs/design-case';
import { Design, MaterialFamilyVersion, Run, Sweep, Team } from '../db/entities';
import { HttpError, NotFoundError } from '../http/errors';
import { isUuid } from '../http/validate';
import { publishEvent } from '../realtime/events';
import { version as appVersion } from '../version';
import { checkSweep, describe, findDesign } from './design-service';

export type RunDeps = { ds: DataSource; boss: PgBoss; runQueue: string };

/** pg-boss inserts the job through our transaction, so a run row never exists without its job. */
function inTransaction(m: EntityManager): PgBoss.ConnectionOptions {
  return { db: { executeSql: async (text: string, values: unknown[]) => ({ rows: await m.query(text, values) }) } };
}

export async function findRun(m: EntityManager, team: Team, id: unknown): Promise<Run> {
  if (!isUuid(id)) throw new NotFoundError('run');
  const r = await m.getRepository(Run).findOneBy({ id, teamId: team.id });
  if (!r) throw new NotFoundError('run');
  return r;
}

export function summarise(r: Run, designName: string, launchedBy: string): RunSummary {
  const p = r.progress as Partial<RunProgress> | null;
  const res = r.result as { objective?: { value: number }; deltaT?: number } | null;
  return {
    id: r.id, designId: r.designId, designName, sweepId: r.sweepId, sweepValue: r.sweepValue, state: r.state, objective: r.objective,
    best: res?.objective?.value ?? p?.best ?? null, deltaT: res?.deltaT ?? null,
    fractionDone: r.state === 'succeeded' ? 1 : p?.fractionDone ?? 0,
    launchedBy, createdAt: r.createdAt.toISOString(), startedAt: r.startedAt?.toISOString() ?? null, finishedAt: r.finishedAt?.toISOString() ?? null,
    error: r.error, attempts: r.attempts,
  };
}

async function insertRun(m: EntityManager, d: Design, params: DesignParameters, userId: string, queue: string, sweep?: { id: string; value: number }): Promise<Run> {
  const version = await m.getRepository(MaterialFamilyVersion).findOneByOrFail({ familyId: d.familyId, version: d.familyVersion });
  const snapshot = { ...d, ...params };
  const run = m.getRepository(Run).create({
    teamId: d.teamId, designId: d.id, designSnapshot: JSON.parse(JSON.stringify(snapshot)) as Record<string, unknown>, familyVersionId: version.id,
    sweepId: sweep?.id ?? null, sweepValue: sweep?.value ?? null,
    caseJson: designToCase(params, version.definition as MaterialInput) as Record<string, unknown>,
    objective: d.objective, state: 'queued', queue, launchedBy: userId, engineVersion: appVersion,
  });
  return m.getRepository(Run).save(run);
}

async function enqueue(boss: PgBoss, m: EntityManager, run: Run): Promise<void> {
  await boss.send(run.queue, { runId: run.id }, inTransaction(m));
}

export async function launchRun(d: RunDeps, team: Team, user: { id: string }, designId: unknown): Promise<RunSummary> {
  const out = await d.ds.transaction(async (m) => {
    const design = await findDesign(m, team, designId);
    const run = await insertRun(m, design, design, user.id, d.runQueue);
    await enqueue(d.boss, m, run);
    return { run, design };
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'run:state', payload: { runId: out.run.id, state: 'queued' } });
  return summarise(out.run, out.design.name, user.id);
}

export async function launchSweep(d: RunDeps, team: Team, user: { id: string; displayName: string }, designId: unknown, req: SweepRequest): Promise<SweepDto> {
  await checkSweep(d.ds, team, designId, req);
  const { sweep, runs, design } = await d.ds.transaction(async (m) => {
    const design = await findDesign(m, team, designId);
    const sweep = await m.getRepository(Sweep).save(m.getRepository(Sweep).create({ teamId: team.id, designId: design.id, parameter: req.parameter, values: req.values, createdBy: user.displayName }));
    const runs: Run[] = [];
    for (const value of req.values) {
      const run = await insertRun(m, design, withSweepValue(design, req.parameter, value), user.id, d.runQueue, { id: sweep.id, value });
      await enqueue(d.boss, m, run);
      runs.push(run);
    }
    return { sweep, runs, design };
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'run:state', payload: { sweepId: sweep.id, state: 'queued' } });
  return { id: sweep.id, designId: design.id, parameter: req.parameter as SweepDto['parameter'], values: sweep.values, createdAt: sweep.createdAt.toISOString(), runs: runs.map((r) => summarise(r, design.name, user.id)) };
}

/**
 * A queued run is cancelled at once; a running one is asked to stop, and its
 * worker keeps the best design so far and marks it cancelled.
 */
export async function cancelRun(d: RunDeps, team: Team, id: unknown): Promise<RunSummary> {
  const run = await d.ds.transaction(async (m) => {
    const r = await findRun(m, team, id);
    if (r.state === 'queued') {
      await m.query(`UPDATE run SET state = 'cancelled', cancel_requested = true, finished_at = now() WHERE id = $1`, [r.id]);
    } else if (r.state === 'running') {
      await m.query('UPDATE run SET cancel_requested = true WHERE id = $1', [r.id]);
    } else {
      throw new HttpError(409, `The run has already ${r.state}.`, [{ field: 'state', message: r.state }], 'Conflict');
    }
    return m.getRepository(Run).findOneByOrFail({ id: r.id });
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'run:cancel', payload: { runId: run.id } });
  if (run.state === 'cancelled') await publishEvent(d.ds, { teamId: team.id, event: 'run:state', payload: { runId: run.id, state: run.state } });
  return summarise(run, String(run.designSnapshot.name), run.launchedBy);
}

async function names(m: EntityManager, userIds: string[]): Promise<Map<string, string>> {
  if (userIds.length === 0) return new Map();
  const rows: Array<{ id: string; display_name: string }> = await m.query('SELECT id, display_name FROM app_user WHERE id = ANY($1)', [userIds]);
  return new Map(rows.map((r) => [r.id, r.display_name]));
}

export async function listRuns(ds: DataSource, team: Team, filter: { designId?: string; sweepId?: string }): Promise<RunSummary[]> {
  const qb = ds.getRepository(Run).createQueryBuilder('r').where('r.teamId = :team', { team: team.id }).orderBy('r.createdAt', 'DESC').take(200);
  if (filter.designId && isUuid(filter.designId)) qb.andWhere('r.designId = :d', { d: filter.designId });
  if (filter.sweepId && isUuid(filter.sweepId)) qb.andWhere('r.sweepId = :s', { s: filter.sweepId });
  const runs = await qb.getMany();
  const who = await names(ds.manager, [...new Set(runs.map((r) => r.launchedBy))]);
  return runs.map((r) => summarise(r, String(r.designSnapshot.name), who.get(r.launchedBy) ?? 'a former member'));
}

export async function runDetail(ds: DataSource, team: Team, id: unknown, userId: string): Promise<RunDetail> {
  return ds.transaction(async (m) => {
    const r = await findRun(m, team, id);
    const design = await describe(m, await findDesign(m, team, r.designId), userId);
    const version = await m.getRepository(MaterialFamilyVersion).findOneByOrFail({ id: r.familyVersionId });
    const trace: Array<{ iteration: number; objective: number; best: number; seconds: number }> = await m.query(
      'SELECT iteration, objective, best, seconds FROM run_trace WHERE run_id = $1 ORDER BY at, iteration', [r.id]);
    const who = await names(m, [r.launchedBy]);
    // The frozen snapshot, not the design as it is now: what was run is what is shown.
    const snap = r.designSnapshot as Record<string, unknown>;
    return {
      run: summarise(r, String(snap.name), who.get(r.launchedBy) ?? 'a former member'),
      design: { ...design, ...pick(snap, design), familyVersion: version.version },
      case: r.caseJson, familyVersion: version.version,
      progress: (r.progress as RunProgress | null) ?? null,
      trace, result: r.result, engineVersion: r.engineVersion,
    };
  });
}

function pick(snap: Record<string, unknown>, like: object): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const k of ['name', 'lengthMm', 'areaMm2', 'hotSide', 'objective', 'heatLoad', 'coldSide', 'minPerCm3', 'maxPerCm3', 'controlPoints', 'monotone', 'starts', 'minZoneMm']) {
    if (k in snap && k in like) out[k] = snap[k];
  }
  return out;
}

export async function sweepDetail(ds: DataSource, team: Team, id: unknown): Promise<SweepDto> {
  if (!isUuid(id)) throw new NotFoundError('sweep');
  const s = await ds.getRepository(Sweep).findOneBy({ id, teamId: team.id });
  if (!s) throw new NotFoundError('sweep');
  const runs = await listRuns(ds, team, { sweepId: s.id });
  return { id: s.id, designId: s.designId, parameter: s.parameter as SweepDto['parameter'], values: s.values, createdAt: s.createdAt.toISOString(), runs: runs.sort((a, b) => (a.sweepValue ?? 0) - (b.sweepValue ?? 0)) };
}
