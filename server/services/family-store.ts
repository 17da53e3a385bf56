import type { EntityManager } from 'typeorm';
import type { FamilyDetailResponse, FamilySummary } from '../../shared/api';
import { MaterialFamily, MaterialFamilyVersion, Team } from '../db/entities';
import { NotFoundError } from '../http/errors';
import { isUuid } from '../http/validate';

/** Reading families of one team; every query is scoped by team id. */
export async function findFamily(m: EntityManager, team: Team, id: unknown, lock = false): Promise<MaterialFamily> {
  if (!isUuid(id)) throw new NotFoundError('family');
  const qb = m.getRepository(MaterialFamily).createQueryBuilder('f').where('f.id = :id AND f.teamId = :team', { id, team: team.id });
  if (lock) qb.setLock('pessimistic_write');
  const f = await qb.getOne();
  if (!f) throw new NotFoundError('family');
  return f;
}

export async function findVersion(m: EntityManager, family: MaterialFamily, version = family.currentVersion): Promise<MaterialFamilyVersion> {
  const v = await m.getRepository(MaterialFamilyVersion).findOneBy({ familyId: family.id, version });
  if (!v) throw new NotFoundError(`version ${version} of this family`);
  return v;
}

export function summarise(f: MaterialFamily, v: MaterialFamilyVersion): FamilySummary {
  return {
    id: f.id,
    name: f.name,
    kind: f.kind,
    carrier: f.carrier,
    summary: v.summary,
    source: v.source,
    createdBy: f.createdBy,
    createdAt: f.createdAt.toISOString(),
    isDemo: f.isDemo,
    version: f.currentVersion,
    archived: f.archived,
    updatedAt: f.updatedAt.toISOString(),
  };
}

/** Runs that used each version: a version with runs is what those runs were computed from. */
async function runCounts(m: EntityManager, versionIds: string[]): Promise<Map<string, number>> {
  if (versionIds.length === 0) return new Map();
  const rows: Array<{ id: string; n: number }> = await m.query('SELECT family_version_id AS id, count(*)::int AS n FROM run WHERE family_version_id = ANY($1) GROUP BY 1', [versionIds]);
  return new Map(rows.map((r) => [r.id, r.n]));
}

export async function detail(m: EntityManager, f: MaterialFamily, version?: number): Promise<FamilyDetailResponse> {
  const versions = await m.getRepository(MaterialFamilyVersion).find({ where: { familyId: f.id }, order: { version: 'DESC' } });
  const counts = await runCounts(m, versions.map((v) => v.id));
  const wanted = versions.find((v) => v.version === (version ?? f.currentVersion));
  if (!wanted) throw new NotFoundError(`version ${version} of this family`);
  const meta = (v: MaterialFamilyVersion) => ({
    version: v.version, summary: v.summary, source: v.source, createdBy: v.createdBy, createdAt: v.createdAt.toISOString(), runCount: counts.get(v.id) ?? 0,
  });
  return {
    family: summarise(f, versions.find((v) => v.version === f.currentVersion) ?? wanted),
    current: { ...meta(wanted), definition: wanted.definition as FamilyDetailResponse['current']['definition'] },
    versions: versions.map(meta),
  };
}
