import type { DataSource } from 'typeorm';
import { CapturedMail, Team } from '../db/entities';

/**
 * The newest captured messages addressed to the caller's team — its current
 * members and the addresses it invited — never another team's (they carry
 * sign-in links; a removed member's address may belong to another team's
 * account now). An invited address that is another team's account is not
 * the inviting team's to read: its mail is that account's, and showing the
 * owner's notice would tell the inviter the address has an account.
 * Capped so the screen stays light.
 */
export async function listOutbox(ds: DataSource, team: Team, limit = 200) {
  const rows = await ds.getRepository(CapturedMail).createQueryBuilder('m')
    .where(`m.to && ARRAY(SELECT lower(email) FROM app_user WHERE team_id = :team AND removed_at IS NULL
      UNION SELECT lower(i.email) FROM invitation i WHERE i.team_id = :team
        AND NOT EXISTS (SELECT 1 FROM app_user u WHERE lower(u.email) = lower(i.email) AND u.removed_at IS NULL AND u.team_id <> :team))`, { team: team.id })
    .orderBy('m.receivedAt', 'DESC')
    .take(limit)
    .getMany();
  return {
    messages: rows.map((m) => ({ id: m.id, receivedAt: m.receivedAt.toISOString(), from: m.from, to: m.to, subject: m.subject, text: m.text })),
  };
}
