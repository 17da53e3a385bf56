import type { DataSource, EntityManager } from 'typeorm';
import type { AuditAction } from '../../shared/api/audit';

/**
 * Who acted, for the audit trail: the team whose admins may read the event
 * (null: nobody's, as for a failed sign-in with an address no account owns),
 * the member (null when nobody was signed in) with their name at the time,
 * and the request's network address.
 */
export type AuditWho = { teamId: string | null; actorId: string | null; actorName: string | null; ip: string | null };

/** What happened, in words for a person (`summary`), with the address and object it concerns. */
export type AuditEntry = { action: AuditAction; summary: string; email?: string | null; subjectId?: string | null };

/**
 * Writes one event through the caller's transaction where there is one, so
 * the record and the change commit together or not at all.
 */
export async function recordAudit(m: EntityManager | DataSource, who: AuditWho, e: AuditEntry): Promise<void> {
  await m.query(
    `INSERT INTO audit_event (team_id, action, actor_id, actor_name, email, subject_id, summary, ip) VALUES ($1, $2, $3, $4, $5, $6, $7, $8)`,
    [who.teamId, e.action, who.actorId, who.actorName, e.email ?? null, e.subjectId ?? null, e.summary, who.ip],
  );
  // Events of no team (failed sign-ins for unknown addresses) only serve an operator's eyes for a while.
  if (who.teamId === null && Math.random() < 0.02) await m.query(`DELETE FROM audit_event WHERE team_id IS NULL AND at < now() - interval '30 days'`);
}
