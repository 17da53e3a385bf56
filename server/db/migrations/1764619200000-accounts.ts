import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Accounts: one team per account, sessions in the shape lucia's PostgreSQL
 * adapter reads (id, user_id, expires_at), single-use invitation and reset
 * tokens stored only as SHA-256 hashes, and rate-limit hits.
 */
export class Accounts1764619200000 implements MigrationInterface {
  name = 'Accounts1764619200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE app_user (
      id text PRIMARY KEY,
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      email text NOT NULL,
      display_name text NOT NULL,
      password_hash text NOT NULL,
      role text NOT NULL CHECK (role IN ('admin', 'physicist', 'grower', 'viewer')),
      created_at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE UNIQUE INDEX app_user_email ON app_user (lower(email))');
    await q.query('CREATE INDEX app_user_team ON app_user (team_id)');
    await q.query(`CREATE TABLE user_session (
      id text PRIMARY KEY,
      user_id text NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
      expires_at timestamptz NOT NULL)`);
    await q.query('CREATE INDEX user_session_user ON user_session (user_id)');
    await q.query(`CREATE TABLE invitation (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      email text NOT NULL,
      role text NOT NULL CHECK (role IN ('admin', 'physicist', 'grower', 'viewer')),
      token_hash text NOT NULL UNIQUE,
      invited_by text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      expires_at timestamptz NOT NULL,
      accepted_at timestamptz,
      revoked_at timestamptz)`);
    await q.query(`CREATE TABLE password_reset (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id text NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
      token_hash text NOT NULL UNIQUE,
      created_at timestamptz NOT NULL DEFAULT now(),
      expires_at timestamptz NOT NULL,
      used_at timestamptz)`);
    await q.query(`CREATE TABLE rate_limit_hit (
      id bigserial PRIMARY KEY,
      key text NOT NULL,
      at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE INDEX rate_limit_hit_key_at ON rate_limit_hit (key, at)');
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['rate_limit_hit', 'password_reset', 'invitation', 'user_session', 'app_user']) await q.query(`DROP TABLE ${t}`);
  }
}
