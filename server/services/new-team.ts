import { randomBytes } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { AppUser, Team } from '../db/entities';
import { ValidationError } from '../http/errors';
import { activeByEmail } from './active-accounts';

/** A team's address-safe, unguessable slug: its name's letters and a random tail. */
export function slugify(name: string): string {
  const base = name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 40) || 'team';
  return `${base}-${randomBytes(3).toString('hex')}`;
}

export type NewTeam = { email: string; displayName: string; teamName: string; passwordHash: string };

/** A new team whose first member is its admin, in the caller's transaction; an address with an account is refused, naming `email`. */
export async function createTeamWithAdmin(m: EntityManager, input: NewTeam): Promise<{ userId: string; teamId: string }> {
  if (await activeByEmail(m, input.email).getExists()) {
    throw new ValidationError([{ field: 'email', message: 'an account with this e-mail exists already: sign in, or reset its password' }]);
  }
  const team = await m.getRepository(Team).save(m.getRepository(Team).create({ name: input.teamName, slug: slugify(input.teamName) }));
  const id = randomBytes(15).toString('base64url');
  await m.getRepository(AppUser).insert({ id, teamId: team.id, email: input.email, displayName: input.displayName, passwordHash: input.passwordHash, role: 'admin' });
  return { userId: id, teamId: team.id };
}
