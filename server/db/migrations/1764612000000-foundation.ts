import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Foundation1764612000000 implements MigrationInterface {
  name = 'Foundation1764612000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE team (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name text NOT NULL,
      slug text NOT NULL UNIQUE,
      created_at timestamptz NOT NULL DEFAULT now())`);
    await q.query(`CREATE TABLE material_family (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      name text NOT NULL,
      kind text NOT NULL CHECK (kind IN ('band', 'table', 'constant')),
      carrier text CHECK (carrier IN ('p', 'n')),
      summary text NOT NULL DEFAULT '',
      source text NOT NULL DEFAULT '',
      created_by text NOT NULL,
      definition jsonb NOT NULL,
      is_demo boolean NOT NULL DEFAULT false,
      created_at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE INDEX material_family_team_name ON material_family (team_id, name)');
    await q.query(`CREATE TABLE captured_mail (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      received_at timestamptz NOT NULL DEFAULT now(),
      mail_from text NOT NULL,
      mail_to text[] NOT NULL,
      subject text NOT NULL,
      text text NOT NULL,
      html text)`);
    await q.query(`CREATE TABLE worker_heartbeat (
      worker_id text PRIMARY KEY,
      hostname text NOT NULL,
      pid integer NOT NULL,
      started_at timestamptz NOT NULL,
      last_seen timestamptz NOT NULL,
      jobs_done integer NOT NULL DEFAULT 0)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE worker_heartbeat');
    await q.query('DROP TABLE captured_mail');
    await q.query('DROP TABLE material_family');
    await q.query('DROP TABLE team');
  }
}
