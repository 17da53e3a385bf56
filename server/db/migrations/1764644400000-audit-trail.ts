import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The audit trail admins read and export: sign-ins (failed ones with the
 * address tried), account and membership changes, releases, deletions and
 * exports — who, what, when, from which IP. A failed sign-in for an address
 * no account owns belongs to no team (team_id NULL): no admin sees it.
 * Rows keep the actor's name as it was; actor_id is kept while the account
 * row exists (accounts are never deleted, removal is soft).
 */
export class AuditTrail1764644400000 implements MigrationInterface {
  name = 'AuditTrail1764644400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE audit_event (
      id bigserial PRIMARY KEY,
      team_id uuid REFERENCES team(id) ON DELETE CASCADE,
      at timestamptz NOT NULL DEFAULT now(),
      action text NOT NULL,
      actor_id text REFERENCES app_user(id) ON DELETE SET NULL,
      actor_name text,
      email text,
      subject_id text,
      summary text NOT NULL,
      ip text)`);
    await q.query('CREATE INDEX audit_event_team_newest ON audit_event (team_id, id DESC)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE audit_event');
  }
}
