import type { EntityManager, SelectQueryBuilder } from 'typeorm';
import { AppUser } from '../db/entities';

/**
 * The active account that owns an address, if any. A removed member's row
 * keeps its old address for history, but no longer owns it: the address may
 * be invited or sign up again (the unique index covers active accounts only).
 */
export function activeByEmail(m: EntityManager, email: string): SelectQueryBuilder<AppUser> {
  return m.getRepository(AppUser).createQueryBuilder('u').where('lower(u.email) = lower(:e) AND u.removedAt IS NULL', { e: email });
}
