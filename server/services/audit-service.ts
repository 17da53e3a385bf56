import type { DataSource } from 'typeorm';
import type { AuditEvent, AuditPage } from '../../shared/api/audit';
import { recordAudit, type AuditWho } from '../audit/audit-log';
import type { Team } from '../db/entities';
import { csvDocument } from './csv-writer';

type Row = { id: string; at: Date; action: AuditEvent['action']; actor_name: string | null; actor_id: string | null; email: string | null; subject_id: string | null; summary: string; ip: string | null };

/** `id` travels as text (a bigint); ORDER BY must then name the table's column, not this text alias. */
const columns = 'id::text AS id, at, action, actor_name, actor_id, email, subject_id, summary, ip';

const toEvent = (r: Row): AuditEvent => ({
  id: r.id, at: r.at.toISOString(), action: r.action, actor: r.actor_name, actorId: r.actor_id, email: r.email, subjectId: r.subject_id, summary: r.summary, ip: r.ip,
});

/** The team's trail, newest first, a page at a time (`before` is the last id of the previous page). */
export async function auditPage(ds: DataSource, team: Team, q: { before?: string; limit: number }): Promise<AuditPage> {
  const rows: Row[] = await ds.query(
    `SELECT ${columns} FROM audit_event WHERE team_id = $1 AND ($2::bigint IS NULL OR id < $2::bigint) ORDER BY audit_event.id DESC LIMIT $3`,
    [team.id, q.before ?? null, q.limit + 1]);
  const page = rows.slice(0, q.limit);
  return { events: page.map(toEvent), next: rows.length > q.limit ? page[page.length - 1]!.id : null };
}

/** The newest rows an export holds; the screen pages through older ones. */
export const exportRowLimit = 50_000;

/**
 * The trail as CSV (newest first, at most `exportRowLimit` rows). The export
 * itself is recorded first, so it is in the file it produces.
 */
export async function exportAudit(ds: DataSource, team: Team, who: AuditWho): Promise<{ filename: string; body: string }> {
  await recordAudit(ds, who, { action: 'audit-exported', summary: 'exported the audit trail as CSV' });
  const rows: Row[] = await ds.query(`SELECT ${columns} FROM audit_event WHERE team_id = $1 ORDER BY audit_event.id DESC LIMIT $2`, [team.id, exportRowLimit]);
  const body = csvDocument({
    header: ['at_utc', 'action', 'actor', 'actor_id', 'email', 'subject_id', 'summary', 'ip'],
    rows: rows.map((r) => [r.at.toISOString(), r.action, r.actor_name, r.actor_id, r.email, r.subject_id, r.summary, r.ip]),
  });
  const stamp = new Date().toISOString().slice(0, 10);
  return { filename: `audit-${team.slug}-${stamp}.csv`, body };
}
