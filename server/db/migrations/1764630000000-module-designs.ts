import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Saved couples and modules: two leg sources (runs or families) and the module settings. */
export class ModuleDesigns1764630000000 implements MigrationInterface {
  name = 'ModuleDesigns1764630000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE module_design (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      name text NOT NULL,
      input jsonb NOT NULL,
      resolved_case jsonb NOT NULL,
      created_by text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE INDEX module_design_team ON module_design (team_id)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE module_design');
  }
}
