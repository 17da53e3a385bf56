import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { hashPassword } from '../../auth/passwords';
import { insertFamily } from '../../services/family-service';
import { writeCooler } from '../../services/cooler-service';
import { writeModule } from '../../services/module-service';
import { AppUser, Cooler, MaterialFamily, ModuleDesign, Team } from '../entities';
import { demoCascade, demoCouple, demoFamilies, demoModule, demoPassword, demoTeam, demoUsers, otherTeam } from './demo-data';

export type SeedCounts = { teams: number; users: number; families: number; modules: number; coolers: number };

/** Insert the demo lab if it is missing; running it twice changes nothing. */
export async function seedDemo(ds: DataSource): Promise<SeedCounts> {
  const passwordHash = await hashPassword(demoPassword);
  return ds.transaction(async (m) => {
    const teams = m.getRepository(Team);
    const users = m.getRepository(AppUser);
    const families = m.getRepository(MaterialFamily);
    const added: SeedCounts = { teams: 0, users: 0, families: 0, modules: 0, coolers: 0 };
    const bySlug = new Map<string, Team>();
    for (const t of [demoTeam, otherTeam]) {
      let team = await teams.findOneBy({ slug: t.slug });
      if (!team) {
        team = await teams.save(teams.create(t));
        added.teams += 1;
      }
      bySlug.set(t.slug, team);
    }
    for (const u of demoUsers) {
      if (await users.existsBy({ email: u.email })) continue;
      await users.insert({ id: randomBytes(15).toString('base64url'), teamId: bySlug.get(u.team)!.id, email: u.email, displayName: u.displayName, role: u.role, passwordHash });
      added.users += 1;
    }
    const lab = bySlug.get(demoTeam.slug)!;
    for (const f of demoFamilies()) {
      if (await families.existsBy({ teamId: lab.id, name: f.name })) continue;
      await insertFamily(m, lab, { ...f, isDemo: true }, 'demo seed');
      added.families += 1;
    }
    const byName = async (name: string) => (await families.findOneByOrFail({ teamId: lab.id, name })).id;
    const module = demoModule;
    if (!(await m.getRepository(ModuleDesign).existsBy({ teamId: lab.id, name: module.name }))) {
      const { pFamily, nFamily, ...settings } = module;
      await writeModule(m, lab, 'demo seed', {
        ...settings,
        p: { kind: 'family', familyId: await byName(pFamily.name), perCm3: pFamily.perCm3, lengthMm: pFamily.lengthMm, areaMm2: pFamily.areaMm2 },
        n: { kind: 'family', familyId: await byName(nFamily.name), perCm3: nFamily.perCm3, lengthMm: nFamily.lengthMm, areaMm2: nFamily.areaMm2 },
      });
      added.modules += 1;
    }
    const uniform = async (familyName: string, leg: { perCm3: number; lengthMm: number; areaMm2: number }) => ({ kind: 'family' as const, familyId: await byName(familyName), ...leg });
    if (!(await m.getRepository(Cooler).existsBy({ teamId: lab.id, name: demoCascade.name }))) {
      const c = demoCascade;
      const p = await uniform(c.pFamily, c.legs.p);
      const n = await uniform(c.nFamily, c.legs.n);
      await writeCooler(m, lab, 'demo seed', {
        kind: 'cascade', name: c.name, notes: c.notes, hotSide: c.hotSide, heatLoad: c.heatLoad, objective: c.objective, wiring: c.wiring, starts: c.starts,
        stages: c.stages.map((s) => ({ ...s, source: { kind: 'legs' as const, p, n } })),
        couplesLimit: { kind: 'total', total: c.couplesTotal },
      });
      added.coolers += 1;
    }
    if (!(await m.getRepository(Cooler).existsBy({ teamId: lab.id, name: demoCouple.name }))) {
      const c = demoCouple;
      await writeCooler(m, lab, 'demo seed', {
        kind: 'couple', name: c.name, notes: c.notes, hotSide: c.hotSide, heatLoad: c.heatLoad, objective: c.objective, starts: c.starts,
        p: await uniform(c.pFamily, c.legs.p), n: await uniform(c.nFamily, c.legs.n),
      });
      added.coolers += 1;
    }
    return added;
  });
}
