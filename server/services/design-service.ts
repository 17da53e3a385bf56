import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { Design as DesignDto, designInputSchema, SweepRequest } from '../../shared/api';
import type { MaterialInput } from '../../shared/engine';
import { designToCase, withSweepValue } from '../../shared/runs/design-case';
import { Design, MaterialFamily, MaterialFamilyVersion, Team } from '../db/entities';
import { engineVerdict } from './engine-check';
import { NotFoundError, ValidationError } from '../http/errors';
import { isUuid } from '../http/validate';
import { findFamily, findVersion } from './family-store';

type DesignInput = z.output<typeof designInputSchema>;

export async function findDesign(m: EntityManager, team: Team, id: unknown): Promise<Design> {
  if (!isUuid(id)) throw new NotFoundError('design');
  const d = await m.getRepository(Design).findOneBy({ id, teamId: team.id });
  if (!d) throw new NotFoundError('design');
  return d;
}

async function followingSet(m: EntityManager, userId: string, designIds: string[]): Promise<Set<string>> {
  if (designIds.length === 0) return new Set();
  const rows: Array<{ design_id: string }> = await m.query('SELECT design_id FROM design_follower WHERE user_id = $1 AND design_id = ANY($2)', [userId, designIds]);
  return new Set(rows.map((r) => r.design_id));
}

export function toDto(d: Design, family: MaterialFamily, following: boolean): DesignDto {
  return {
    id: d.id, name: d.name, notes: d.notes, familyId: d.familyId, familyName: family.name, familyVersion: d.familyVersion, carrier: family.carrier,
    lengthMm: d.lengthMm, areaMm2: d.areaMm2, hotSide: d.hotSide, objective: d.objective, heatLoad: d.heatLoad, coldSide: d.coldSide,
    minPerCm3: d.minPerCm3, maxPerCm3: d.maxPerCm3, controlPoints: d.controlPoints, monotone: d.monotone, starts: d.starts, minZoneMm: d.minZoneMm,
    coldContactMicroOhmCm2: d.coldContactMicroOhmCm2, hotContactMicroOhmCm2: d.hotContactMicroOhmCm2, parasitic: d.parasitic,
    parasiticLoadW: d.parasiticLoadW, emissivity: d.emissivity, surroundingsK: d.surroundingsK,
    createdBy: d.createdBy, createdAt: d.createdAt.toISOString(), updatedAt: d.updatedAt.toISOString(), following,
  };
}

export async function describe(m: EntityManager, d: Design, userId: string): Promise<DesignDto> {
  const family = await m.getRepository(MaterialFamily).findOneByOrFail({ id: d.familyId });
  return toDto(d, family, (await followingSet(m, userId, [d.id])).has(d.id));
}

export async function listDesigns(ds: DataSource, team: Team, userId: string): Promise<DesignDto[]> {
  const designs = await ds.getRepository(Design).find({ where: { teamId: team.id }, order: { updatedAt: 'DESC' } });
  const families = new Map((await ds.getRepository(MaterialFamily).findBy({ teamId: team.id })).map((f) => [f.id, f]));
  const following = await followingSet(ds.manager, userId, designs.map((d) => d.id));
  return designs.map((d) => toDto(d, families.get(d.familyId)!, following.has(d.id)));
}

/** The family (of the caller's team) and the version a design uses. */
async function designFamily(m: EntityManager, team: Team, input: { familyId: string; familyVersion?: number }): Promise<MaterialFamilyVersion> {
  let family: MaterialFamily;
  try {
    family = await findFamily(m, team, input.familyId);
  } catch {
    throw new ValidationError([{ field: 'familyId', message: 'no such material family in this team' }]);
  }
  return findVersion(m, family, input.familyVersion ?? family.currentVersion).catch(() => {
    throw new ValidationError([{ field: 'familyVersion', message: `the family has no version ${input.familyVersion}` }]);
  });
}

/**
 * The engine's verdict on a design's case, so a design that cannot run is
 * refused when it is saved rather than when a worker picks it up. Computed in
 * an API thread: with a large measured family it takes a few hundred ms.
 */
async function checkAgainstEngine(m: EntityManager, team: Team, input: DesignInput): Promise<{ version: number }> {
  const version = await designFamily(m, team, input);
  const verdict = await engineVerdict({ kind: 'cases', cases: [designToCase({ ...input, coldSide: input.coldSide ?? null }, version.definition as MaterialInput)] }, 'design');
  if (!verdict.ok) throw new ValidationError([{ field: engineFieldToDesign(verdict.field), message: verdict.message }]);
  return { version: version.version };
}

/**
 * Every swept value must make a case the engine accepts, or nothing is
 * queued: up to 40 cases, each building the family's spline, so in an API
 * thread and before any transaction (no database connection waits on it).
 */
export async function checkSweep(ds: DataSource, team: Team, designId: unknown, req: SweepRequest): Promise<void> {
  const design = await findDesign(ds.manager, team, designId);
  const version = await ds.getRepository(MaterialFamilyVersion).findOneByOrFail({ familyId: design.familyId, version: design.familyVersion });
  const cases = req.values.map((value) => designToCase(withSweepValue(design, req.parameter, value), version.definition as MaterialInput));
  const verdict = await engineVerdict({ kind: 'cases', cases }, 'values');
  if (!verdict.ok) throw new ValidationError([{ field: `values[${verdict.index}]`, message: `${req.parameter} = ${req.values[verdict.index]}: ${verdict.message}` }]);
}

/** Engine case fields back to the form's fields, so the error lands beside the right input. */
function engineFieldToDesign(field: string): string {
  const map: Record<string, string> = {
    length: 'lengthMm', area: 'areaMm2', 'bounds.minPerCm3': 'minPerCm3', 'bounds.maxPerCm3': 'maxPerCm3', bounds: 'maxPerCm3',
    'contactResistivity.cold': 'coldContactMicroOhmCm2', 'contactResistivity.hot': 'hotContactMicroOhmCm2',
    'parasitic.heatLoad': 'parasiticLoadW', 'parasitic.radiation.emissivity': 'emissivity', 'parasitic.radiation.surroundings': 'surroundingsK',
  };
  if (field.startsWith('material')) return 'familyId';
  return map[field] ?? field;
}

export async function saveDesign(ds: DataSource, team: Team, user: { id: string; displayName: string }, input: DesignInput, id?: unknown): Promise<DesignDto> {
  // An unknown design answers 404 before its body is judged; the engine judges it before the transaction.
  if (id !== undefined) await findDesign(ds.manager, team, id);
  const { version } = await checkAgainstEngine(ds.manager, team, input);
  return ds.transaction(async (m) => {
    const existing = id === undefined ? undefined : await findDesign(m, team, id);
    const repo = m.getRepository(Design);
    const { familyVersion: _v, ...fields } = input;
    const d = existing
      ? Object.assign(existing, { ...fields, coldSide: input.coldSide ?? null, surroundingsK: input.surroundingsK ?? null, familyVersion: version })
      : repo.create({ ...fields, coldSide: input.coldSide ?? null, surroundingsK: input.surroundingsK ?? null, familyVersion: version, teamId: team.id, createdBy: user.displayName });
    const saved = await repo.save(d);
    // Whoever creates a design follows it: they hear when its runs end.
    if (id === undefined) await m.query('INSERT INTO design_follower (design_id, user_id) VALUES ($1, $2) ON CONFLICT DO NOTHING', [saved.id, user.id]);
    return describe(m, saved, user.id);
  });
}

export async function setFollowing(ds: DataSource, team: Team, userId: string, id: unknown, follow: boolean): Promise<DesignDto> {
  return ds.transaction(async (m) => {
    const d = await findDesign(m, team, id);
    if (follow) await m.query('INSERT INTO design_follower (design_id, user_id) VALUES ($1, $2) ON CONFLICT DO NOTHING', [d.id, userId]);
    else await m.query('DELETE FROM design_follower WHERE design_id = $1 AND user_id = $2', [d.id, userId]);
    return describe(m, d, userId);
  });
}
