import type { DataSource, EntityManager } from 'typeorm';
import type { FamiliesResponse, FamilyDetailResponse, FamilySummary } from '../../shared/api';
import type { createFamilyRequestSchema, updateFamilyRequestSchema, duplicateFamilyRequestSchema } from '../../shared/api';
import type { MaterialInput } from '../../shared/engine';
import type { z } from 'zod';
import { recordAudit, type AuditWho } from '../audit/audit-log';
import { MaterialFamily, MaterialFamilyVersion, Team } from '../db/entities';
import { HttpError, ValidationError } from '../http/errors';
import { publishEvent } from '../db/events';
import { checkDefinition, checkDefinitionOffLoop } from './family-definition';
import { detail, findFamily, findVersion, summarise } from './family-store';

type CreateInput = z.output<typeof createFamilyRequestSchema>;
type UpdateInput = z.output<typeof updateFamilyRequestSchema>;
type DuplicateInput = z.output<typeof duplicateFamilyRequestSchema>;

export async function listFamilies(ds: DataSource, team: Team, archived: boolean): Promise<FamiliesResponse> {
  const rows = await ds.getRepository(MaterialFamily)
    .createQueryBuilder('f')
    .innerJoinAndMapOne('f.current', MaterialFamilyVersion, 'v', 'v.familyId = f.id AND v.version = f.currentVersion')
    .where('f.teamId = :team AND f.archived = :archived', { team: team.id, archived })
    .orderBy('lower(f.name)', 'ASC')
    .getMany();
  return {
    team: { id: team.id, name: team.name },
    families: rows.map((f) => summarise(f, (f as MaterialFamily & { current: MaterialFamilyVersion }).current)),
  };
}

export function getFamily(ds: DataSource, team: Team, id: unknown, version?: number): Promise<FamilyDetailResponse> {
  return ds.transaction(async (m) => detail(m, await findFamily(m, team, id), version));
}

async function assertNameFree(m: EntityManager, team: Team, name: string, except?: string): Promise<void> {
  const clash = await m.getRepository(MaterialFamily).createQueryBuilder('f')
    .where('f.teamId = :team AND lower(f.name) = lower(:name)', { team: team.id, name })
    .andWhere(except ? 'f.id <> :except' : 'TRUE', { except })
    .getOne();
  if (clash) throw new HttpError(409, `A family named "${clash.name}" already exists in this team.`, [{ field: 'name', message: 'another family of the team has this name' }], 'Conflict');
}

type NewFamily = { name: string; summary: string; source: string; definition: MaterialInput; isDemo?: boolean };

/**
 * Inserts the family and its version 1 in the caller's transaction. Requests
 * pass the `carrier` the engine found when it checked the definition off the
 * event loop; without it (seed, tests) the definition is checked here.
 */
export async function insertFamily(m: EntityManager, team: Team, input: NewFamily, by: string, carrier: 'p' | 'n' = checkDefinition(input.definition)): Promise<MaterialFamily> {
  await assertNameFree(m, team, input.name);
  const families = m.getRepository(MaterialFamily);
  const f = await families.save(families.create({ teamId: team.id, name: input.name, kind: input.definition.kind, carrier, createdBy: by, isDemo: input.isDemo ?? false, currentVersion: 1 }));
  const versions = m.getRepository(MaterialFamilyVersion);
  await versions.save(versions.create({ familyId: f.id, version: 1, definition: input.definition as Record<string, unknown>, summary: input.summary, source: input.source, createdBy: by }));
  return f;
}

/** Tells the team's open browsers (and watchers of the family) that it changed. */
export async function announceFamily(ds: DataSource, team: Team, f: FamilySummary): Promise<FamilySummary> {
  const payload = { familyId: f.id, version: f.version, archived: f.archived };
  await publishEvent(ds, { teamId: team.id, event: 'family:changed', payload });
  await publishEvent(ds, { teamId: team.id, room: `family:${f.id}`, event: 'family:changed', payload });
  return f;
}

export async function createFamily(ds: DataSource, team: Team, input: CreateInput, by: string): Promise<FamilySummary> {
  // Checked before the transaction: no database connection waits on the engine.
  const carrier = await checkDefinitionOffLoop(input.definition);
  const created = await ds.transaction(async (m) => {
    const f = await insertFamily(m, team, input, by, carrier);
    return summarise(f, await findVersion(m, f));
  });
  return announceFamily(ds, team, created);
}

/** Name changes in place; any change of content writes the next immutable version. */
export async function updateFamily(ds: DataSource, team: Team, id: unknown, input: UpdateInput, by: string): Promise<FamilySummary> {
  // An unknown family answers 404 and a change of kind 400 before the engine is asked; the engine
  // checks a new definition before the transaction, so no database connection waits on it.
  const before = await findFamily(ds.manager, team, id);
  if (input.definition && input.definition.kind !== before.kind) {
    throw new ValidationError([{ field: 'definition.kind', message: `this family is a ${before.kind} family; a ${input.definition.kind} family is a new family` }]);
  }
  const carrier = input.definition ? await checkDefinitionOffLoop(input.definition) : undefined;
  return announceFamily(ds, team, await ds.transaction(async (m) => {
    const f = await findFamily(m, team, id, true);
    const current = await findVersion(m, f);
    if (input.name !== undefined && input.name !== f.name) {
      await assertNameFree(m, team, input.name, f.id);
      f.name = input.name;
    }
    const next = {
      definition: (input.definition ?? current.definition) as MaterialInput,
      summary: input.summary ?? current.summary,
      source: input.source ?? current.source,
    };
    const changed = JSON.stringify(next.definition) !== JSON.stringify(current.definition) || next.summary !== current.summary || next.source !== current.source;
    if (changed) {
      // Without a new definition the current one stays: it was checked when it was written.
      if (carrier && f.carrier && carrier !== f.carrier) throw new ValidationError([{ field: 'definition', message: `the family is ${f.carrier}-type; this definition is ${carrier}-type` }]);
      const versions = m.getRepository(MaterialFamilyVersion);
      f.currentVersion += 1;
      await versions.save(versions.create({ familyId: f.id, version: f.currentVersion, ...next, definition: next.definition as Record<string, unknown>, createdBy: by }));
    }
    const saved = await m.getRepository(MaterialFamily).save(f);
    return summarise(saved, await findVersion(m, saved));
  }));
}

export async function duplicateFamily(ds: DataSource, team: Team, id: unknown, input: DuplicateInput, by: string): Promise<FamilySummary> {
  return announceFamily(ds, team, await ds.transaction(async (m) => {
    const f = await findFamily(m, team, id);
    const v = await findVersion(m, f);
    // The engine checked this version when it was written; the copy takes its carrier instead of building it again.
    const copy = await insertFamily(m, team, {
      name: input.name,
      summary: v.summary,
      source: `${v.source}${v.source ? '\n' : ''}Duplicated from "${f.name}" version ${v.version}.`,
      definition: v.definition as MaterialInput,
    }, by, f.carrier ?? undefined);
    return summarise(copy, await findVersion(m, copy));
  }));
}

export async function setArchived(ds: DataSource, team: Team, who: AuditWho, id: unknown, archived: boolean): Promise<FamilySummary> {
  return announceFamily(ds, team, await ds.transaction(async (m) => {
    const f = await findFamily(m, team, id, true);
    const changed = f.archived !== archived;
    f.archived = archived;
    const saved = await m.getRepository(MaterialFamily).save(f);
    if (changed) await recordAudit(m, who, { action: archived ? 'family-archived' : 'family-unarchived', summary: `${archived ? 'archived' : 'restored'} the family ${f.name}`, subjectId: f.id });
    return summarise(saved, await findVersion(m, saved));
  }));
}
