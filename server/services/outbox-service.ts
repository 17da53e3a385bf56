import type { DataSource } from 'typeorm';
import { CapturedMail, Team } from '../db/entities';

/**
 * The newest captured messages addressed to the caller's team — its current
 * members and the addresses it invited — never another team's (they carry
 * sign-in links; a removed member's address may belong to another team's
 * account now). Capped so the screen stays light.
 */
export async function listOutbox(ds: DataSource, team: Team, limit = 200) {
  const rows = await ds.getRepository(CapturedMail).createQueryBuilder('m')
    .where(`m.to && ARRAY(SELECT lower(email) FROM app_user WHERE team_id = :team AND removed_at IS NULL UNION SELECT lower(email) FROM invitation WHERE team_id = :team)`, { team: team.id })
    .orderBy('m.receivedAt', 'DESC')
    .take(limit)
    .getMany();
  return {
    messages: rows.map((m) => ({ id: m.id, receivedAt: m.receivedAt.toISOString(), from: m.from, to: m.to, subject: m.subject, text: m.text })),
  };
}
