import type { DataSource } from 'typeorm';
import { MaterialFamily, Team } from '../entities';
import { insertFamily } from '../../services/family-service';
import { demoFamilies, demoTeam, otherTeam } from './demo-data';

/** Insert the demo lab if it is missing; running it twice changes nothing. */
export async function seedDemo(ds: DataSource): Promise<{ teams: number; families: number }> {
  return ds.transaction(async (m) => {
    const teams = m.getRepository(Team);
    const families = m.getRepository(MaterialFamily);
    let addedTeams = 0;
    let addedFamilies = 0;
    const ensureTeam = async (t: { slug: string; name: string }): Promise<Team> => {
      const found = await teams.findOneBy({ slug: t.slug });
      if (found) return found;
      addedTeams += 1;
      return teams.save(teams.create(t));
    };
    const lab = await ensureTeam(demoTeam);
    await ensureTeam(otherTeam);
    for (const f of demoFamilies()) {
      if (await families.existsBy({ teamId: lab.id, name: f.name })) continue;
      await insertFamily(m, lab, { ...f, isDemo: true }, 'demo seed');
      addedFamilies += 1;
    }
    return { teams: addedTeams, families: addedFamilies };
  });
}
