import type { DataSource } from 'typeorm';
import { MaterialFamily, Team } from '../db/entities';

export type FamilySummary = {
  id: string;
  name: string;
  kind: MaterialFamily['kind'];
  carrier: MaterialFamily['carrier'];
  summary: string;
  source: string;
  createdBy: string;
  createdAt: string;
  isDemo: boolean;
};

export async function listFamilies(ds: DataSource, team: Team): Promise<{ team: { id: string; name: string }; families: FamilySummary[] }> {
  const rows = await ds.getRepository(MaterialFamily).find({ where: { teamId: team.id }, order: { name: 'ASC' } });
  return {
    team: { id: team.id, name: team.name },
    families: rows.map((f) => ({
      id: f.id,
      name: f.name,
      kind: f.kind,
      carrier: f.carrier,
      summary: f.summary,
      source: f.source,
      createdBy: f.createdBy,
      createdAt: f.createdAt.toISOString(),
      isDemo: f.isDemo,
    })),
  };
}
