import type { DataSource, EntityManager } from 'typeorm';
import type { Cooler as CoolerDto, CoolerSummary, RunSummary } from '../../shared/api';
import { recordAudit, type AuditWho } from '../audit/audit-log';
import { Cooler, Team } from '../db/entities';
import { HttpError, NotFoundError, ValidationError } from '../http/errors';
import { isUuid } from '../http/validate';
import { coolerCase, engineFieldToInput, type CoolerInputOut } from './cooler-case';
import { coolerHeadline, coolerResultOf } from '../../shared/runs/cooler-results';
import { engineVerdict } from './engine-check';
import { judge, type EngineVerdict } from './engine-judge';
import { launchOne, type RunDeps } from './run-service';

/**
 * Saved matched couples and cascades. The sources are resolved into the
 * engine case and the engine checks it when the cooler is saved, so a saved
 * cooler always runs; runs of it go through the one launch path (run-service).
 */
export async function findCooler(m: EntityManager, team: Team, id: unknown): Promise<Cooler> {
  if (!isUuid(id)) throw new NotFoundError('cooler');
  const row = await m.getRepository(Cooler).findOneBy({ id, teamId: team.id });
  if (!row) throw new NotFoundError('cooler');
  return row;
}

export const coolerDto = (r: Cooler): CoolerDto => ({
  id: r.id, kind: r.kind, name: r.name, notes: r.notes, input: r.input as CoolerDto['input'], case: r.caseJson,
  createdBy: r.createdBy, createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString(),
});

type LatestRun = NonNullable<CoolerSummary['latestRun']>;

/** Each cooler's newest run, with its headline ΔT and power when it has a result. */
async function latestRuns(ds: DataSource, coolerIds: string[]): Promise<Map<string, LatestRun>> {
  if (coolerIds.length === 0) return new Map();
  const rows: Array<{ cooler_id: string; id: string; number: number; state: LatestRun['state']; kind: string; result: unknown }> = await ds.query(
    `SELECT DISTINCT ON (cooler_id) cooler_id, id, number, state, kind, result FROM run WHERE cooler_id = ANY($1) ORDER BY cooler_id, created_at DESC`, [coolerIds]);
  return new Map(rows.map((r) => {
    const parsed = coolerResultOf(r.kind, r.result);
    const h = parsed ? coolerHeadline(parsed) : null;
    return [r.cooler_id, { id: r.id, number: r.number, state: r.state, deltaT: h?.deltaT ?? null, power: h?.power ?? null }];
  }));
}

/** The team's coolers, newest first, each with its latest run. */
export async function listCoolers(ds: DataSource, team: Team): Promise<CoolerSummary[]> {
  const rows = await ds.getRepository(Cooler).find({ where: { teamId: team.id }, order: { updatedAt: 'DESC' } });
  const latest = await latestRuns(ds, rows.map((r) => r.id));
  return rows.map((r) => {
    const { case: _c, ...rest } = coolerDto(r);
    return { ...rest, latestRun: latest.get(r.id) ?? null };
  });
}

export async function getCooler(ds: DataSource, team: Team, id: unknown): Promise<CoolerDto> {
  return coolerDto(await findCooler(ds.manager, team, id));
}

/** A case the engine refuses is refused with the input's field and the engine's message. */
function refuseUnless(input: CoolerInputOut, verdict: EngineVerdict): void {
  if (!verdict.ok) throw new ValidationError([{ field: engineFieldToInput(input, verdict.field), message: verdict.message }]);
}

async function storeCooler(m: EntityManager, team: Team, by: string, input: CoolerInputOut, caseJson: Record<string, unknown>, id?: unknown): Promise<CoolerDto> {
  const repo = m.getRepository(Cooler);
  const existing = id === undefined ? undefined : await findCooler(m, team, id);
  const fields = { kind: input.kind, name: input.name, notes: input.notes, input: JSON.parse(JSON.stringify(input)) as Record<string, unknown>, caseJson };
  const row = existing ? Object.assign(existing, fields) : repo.create({ ...fields, teamId: team.id, createdBy: by });
  return coolerDto(await repo.save(row));
}

/** A cooler keeps its kind: a couple edited into a cascade would make its runs' history read as another thing. */
async function sameKind(m: EntityManager, team: Team, input: CoolerInputOut, id: unknown): Promise<void> {
  const existing = await findCooler(m, team, id);
  if (existing.kind !== input.kind) throw new ValidationError([{ field: 'kind', message: `this cooler is a ${existing.kind}; save a ${input.kind} as a new cooler` }]);
}

/**
 * A request's create or replace: 404 for an unknown cooler first, then the
 * sources resolved and the engine's check (in an API thread when a leg
 * builds a measured table), then the transaction.
 */
export async function saveCooler(ds: DataSource, team: Team, by: string, input: CoolerInputOut, id?: unknown): Promise<CoolerDto> {
  if (id !== undefined) await sameKind(ds.manager, team, input, id);
  const caseJson = await coolerCase(ds.manager, team, input);
  refuseUnless(input, await engineVerdict({ kind: input.kind, json: caseJson }, input.kind === 'couple' ? 'p' : 'stages'));
  return ds.transaction((m) => storeCooler(m, team, by, input, caseJson, id));
}

/** Create a cooler inside the caller's transaction, checked on the calling thread (the seed, whose families exist only in its transaction). */
export async function writeCooler(m: EntityManager, team: Team, by: string, input: CoolerInputOut): Promise<CoolerDto> {
  const caseJson = await coolerCase(m, team, input);
  refuseUnless(input, judge({ kind: input.kind, json: caseJson }));
  return storeCooler(m, team, by, input, caseJson);
}

/** Delete a cooler and its finished runs; refused while one of its runs is queued or running (cancel it first). */
export async function deleteCooler(ds: DataSource, team: Team, who: AuditWho, id: unknown): Promise<void> {
  await ds.transaction(async (m) => {
    const cooler = await findCooler(m, team, id);
    await m.query('SELECT id FROM cooler WHERE id = $1 FOR UPDATE', [cooler.id]);
    const [{ n }] = (await m.query(`SELECT count(*)::int AS n FROM run WHERE cooler_id = $1 AND state IN ('queued', 'running')`, [cooler.id])) as Array<{ n: number }>;
    if (n > 0) throw new HttpError(409, `The cooler has ${n} run${n === 1 ? '' : 's'} queued or running; cancel ${n === 1 ? 'it' : 'them'} before deleting the cooler.`, [{ field: 'runs', message: `${n} unfinished` }], 'Conflict');
    const [{ runs }] = (await m.query('SELECT count(*)::int AS runs FROM run WHERE cooler_id = $1', [cooler.id])) as Array<{ runs: number }>;
    await m.getRepository(Cooler).remove(cooler);
    await recordAudit(m, who, { action: 'cooler-deleted', summary: `deleted the ${cooler.kind} ${cooler.name} and its ${runs} finished run${runs === 1 ? '' : 's'}`, subjectId: cooler.id });
  });
}

/** Queue a run of the cooler: its case and a snapshot of it frozen, through the one launch path (limits, numbers, fair share). */
export async function launchCoolerRun(d: RunDeps, team: Team, user: { id: string; displayName: string }, id: unknown): Promise<RunSummary> {
  return launchOne(d, team, user, async (m) => {
    const cooler = await findCooler(m, team, id);
    // Lock it so a delete cannot slip between this read and the run's insert.
    await m.query('SELECT id FROM cooler WHERE id = $1 FOR SHARE', [cooler.id]);
    const snapshot = coolerDto(cooler);
    return {
      kind: cooler.kind, designId: null, designSnapshot: null, familyVersionId: null, coolerId: cooler.id,
      coolerSnapshot: JSON.parse(JSON.stringify(snapshot)) as Record<string, unknown>, caseJson: cooler.caseJson, objective: String(cooler.input.objective ?? 'maxDeltaT'),
    };
  });
}
