import { join } from 'node:path';
import { In, type DataSource, type EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { LegSource, ModuleCsvVersus, ModuleDesign as ModuleDto, ModuleSummary, moduleInputSchema } from '../../shared/api';
import { legsFromRun, type LegDefinitionInput, type RunResultLegs } from '../../shared/engine';
import { recordAudit, type AuditWho } from '../audit/audit-log';
import { MaterialFamily, ModuleDesign, Run, Team } from '../db/entities';
import { NotFoundError, ValidationError } from '../http/errors';
import { isUuid } from '../http/validate';
import { inApiThread } from './api-threads';
import { engineVerdict } from './engine-check';
import { judge, type EngineVerdict } from './engine-judge';
import { findFamily, findVersion } from './family-store';
import type { CurvesCsvInput } from './module-curves-csv';
import { findRun } from './run-service';
import { runName } from './run-summary';

type ModuleInput = z.output<typeof moduleInputSchema>;

/** A leg source of the caller's team, as the engine's leg definition (modules and cooler stages share it). */
export async function resolveLeg(m: EntityManager, team: Team, s: LegSource, field: string): Promise<LegDefinitionInput> {
  if (s.kind === 'run') {
    const run = await findRun(m, team, s.runId).catch(() => { throw new ValidationError([{ field: `${field}.runId`, message: 'no such run in this team' }]); });
    if (run.kind !== 'leg') {
      const hint = run.kind === 'couple' ? 'a cascade stage takes both its legs as {kind: "couple", runId}' : 'a cascade has no single leg to take';
      throw new ValidationError([{ field: `${field}.runId`, message: `the run is a ${run.kind} run, not a leg run (${hint})` }]);
    }
    if (!run.result) throw new ValidationError([{ field: `${field}.runId`, message: `the run has no result (it is ${run.state})` }]);
    const legs = legsFromRun(run.caseJson, run.result as unknown as RunResultLegs);
    const leg = legs[s.leg];
    if (!leg) throw new ValidationError([{ field: `${field}.leg`, message: `the run has no ${s.leg} leg` }]);
    return leg;
  }
  const family = await findFamily(m, team, s.familyId).catch(() => { throw new ValidationError([{ field: `${field}.familyId`, message: 'no such family in this team' }]); });
  const version = await findVersion(m, family, s.version);
  const material = version.definition as NonNullable<LegDefinitionInput['material']>;
  // A constant-property material does not depend on doping: the engine's couple and cascade checks refuse one with it.
  return { length: s.lengthMm * 1e-3, area: s.areaMm2 * 1e-6, material, ...(material.kind === 'constant' ? {} : { doping: s.perCm3 }) };
}

/** The engine case of a module (checked separately, so a saved module always computes). */
async function resolveCase(m: EntityManager, team: Team, input: ModuleInput): Promise<Record<string, unknown>> {
  // A run's leg carries its design's contacts and parasitic heat; a contact
  // value set on the module replaces both legs' (the engine lets a leg's own
  // value win, so the legs' are dropped here).
  const own = (leg: LegDefinitionInput): LegDefinitionInput => {
    if (input.contactResistivity === undefined) return leg;
    const { contactResistivity: _c, ...rest } = leg;
    return rest;
  };
  const p = own(await resolveLeg(m, team, input.p, 'p'));
  const n = own(await resolveLeg(m, team, input.n, 'n'));
  const c = {
    hotSide: input.hotSide, deltaT: input.deltaT, p, n, couples: input.couples,
    ...(input.areaRatio !== undefined ? { areaRatio: input.areaRatio, n: { ...n, area: undefined } } : {}),
    ...(input.contactResistivity !== undefined ? { contactResistivity: input.contactResistivity } : {}),
    ...(input.coldPlateResistance !== undefined ? { coldPlateResistance: input.coldPlateResistance } : {}),
    ...(input.hotPlateResistance !== undefined ? { hotPlateResistance: input.hotPlateResistance } : {}),
    ...(input.currentLimit !== undefined ? { currentLimit: input.currentLimit } : {}),
  };
  return JSON.parse(JSON.stringify(c)) as Record<string, unknown>;
}

/** A module the engine refuses is refused with the engine's field and message. */
function refuseUnless(verdict: EngineVerdict): void {
  if (!verdict.ok) throw new ValidationError([{ field: verdict.field, message: verdict.message }]);
}

async function findModule(m: EntityManager, team: Team, id: unknown): Promise<ModuleDesign> {
  if (!isUuid(id)) throw new NotFoundError('module');
  const row = await m.getRepository(ModuleDesign).findOneBy({ id, teamId: team.id });
  if (!row) throw new NotFoundError('module');
  return row;
}

const toDto = (r: ModuleDesign): ModuleDto => ({
  id: r.id, name: r.name, notes: String((r.input as { notes?: string }).notes ?? ''), input: r.input as ModuleDto['input'], case: r.resolvedCase,
  createdBy: r.createdBy, createdAt: r.createdAt.toISOString(), updatedAt: r.updatedAt.toISOString(),
});

/** The name of each leg's source (run → its number and design, family → the family); null for one deleted since. */
async function sourceNamer(ds: DataSource, team: Team, inputs: ModuleInput[]): Promise<(s: LegSource) => string | null> {
  const sources = inputs.flatMap((i) => [i.p, i.n]);
  const runIds = [...new Set(sources.flatMap((s) => (s.kind === 'run' ? [s.runId] : [])))];
  const familyIds = [...new Set(sources.flatMap((s) => (s.kind === 'family' ? [s.familyId] : [])))];
  const runs = runIds.length ? await ds.getRepository(Run).findBy({ teamId: team.id, id: In(runIds) }) : [];
  const families = familyIds.length ? await ds.getRepository(MaterialFamily).findBy({ teamId: team.id, id: In(familyIds) }) : [];
  // "Run 12 · Stage-2 leg": two runs of one design are two different legs.
  const runNames = new Map(runs.map((r) => [r.id, `Run ${r.number} · ${runName(r)}`]));
  const familyName = new Map(families.map((f) => [f.id, f.name]));
  return (s) => (s.kind === 'run' ? runNames.get(s.runId) : familyName.get(s.familyId)) ?? null;
}

export async function listModules(ds: DataSource, team: Team): Promise<ModuleSummary[]> {
  const rows = await ds.getRepository(ModuleDesign).find({ where: { teamId: team.id }, order: { updatedAt: 'DESC' } });
  const nameOf = await sourceNamer(ds, team, rows.map((r) => r.input as unknown as ModuleInput));
  return rows.map((r) => {
    const { case: _c, ...rest } = toDto(r);
    const input = r.input as unknown as ModuleInput;
    return { ...rest, sourceNames: { p: nameOf(input.p), n: nameOf(input.n) } };
  });
}

export async function getModule(ds: DataSource, team: Team, id: unknown): Promise<ModuleDto> {
  return toDto(await findModule(ds.manager, team, id));
}

/** Create (no id) or replace a module whose resolved case the engine has accepted, inside the caller's transaction. */
async function storeModule(m: EntityManager, team: Team, by: string, input: ModuleInput, resolvedCase: Record<string, unknown>, id?: unknown): Promise<ModuleDto> {
  const existing = id === undefined ? undefined : await findModule(m, team, id);
  const repo = m.getRepository(ModuleDesign);
  const row = existing ? Object.assign(existing, { name: input.name, input, resolvedCase }) : repo.create({ teamId: team.id, name: input.name, input, resolvedCase, createdBy: by });
  return toDto(await repo.save(row));
}

/** Create or replace a module inside the caller's transaction, checked on the calling thread (the seed, whose families exist only in its transaction). */
export async function writeModule(m: EntityManager, team: Team, by: string, input: ModuleInput, id?: unknown): Promise<ModuleDto> {
  if (id !== undefined) await findModule(m, team, id);
  const resolvedCase = await resolveCase(m, team, input);
  refuseUnless(judge({ kind: 'module', json: resolvedCase }));
  return storeModule(m, team, by, input, resolvedCase, id);
}

/**
 * A request's create or replace: 404 for an unknown module first, then the
 * engine's check in an API thread (building two legs' families takes up to a
 * few hundred ms with large measured tables), then the transaction.
 */
export async function saveModule(ds: DataSource, team: Team, by: string, input: ModuleInput, id?: unknown): Promise<ModuleDto> {
  if (id !== undefined) await findModule(ds.manager, team, id);
  const resolvedCase = await resolveCase(ds.manager, team, input);
  refuseUnless(await engineVerdict({ kind: 'module', json: resolvedCase }, 'module'));
  return ds.transaction((m) => storeModule(m, team, by, input, resolvedCase, id));
}

/** Delete a saved module (runs and families it was built from are untouched). */
export async function deleteModule(ds: DataSource, team: Team, who: AuditWho, id: unknown): Promise<void> {
  await ds.transaction(async (m) => {
    const module = await findModule(m, team, id);
    const moduleId = module.id;
    await m.getRepository(ModuleDesign).remove(module);
    await recordAudit(m, who, { action: 'module-deleted', summary: `deleted the module ${module.name}`, subjectId: moduleId });
  });
}

const curvesThread = join(__dirname, 'module-curves-thread.ts');

/** The module's curve versus current (at its ΔT) or versus ΔT as CSV, computed now by the engine in an API thread (seconds of root finding). */
export async function moduleCurvesCsv(ds: DataSource, team: Team, id: unknown, versus: ModuleCsvVersus = 'current'): Promise<{ filename: string; body: string }> {
  const row = await findModule(ds.manager, team, id);
  const input: CurvesCsvInput = { name: row.name, resolvedCase: row.resolvedCase, versus };
  return inApiThread<{ filename: string; body: string }>(curvesThread, input, 'module');
}
