import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Coolers: a saved matched couple or cascade (the trade-unit input and the
 * engine case resolved from its sources when saved). Their runs are rows of
 * the one `run` table, so they share its queue, limits, numbers, checkpoints
 * and mail: `kind` tells a leg run (a design, as before) from a couple or
 * cascade run (a cooler and its frozen snapshot). Existing rows stay leg runs.
 */
export class Coolers1764658800000 implements MigrationInterface {
  name = 'Coolers1764658800000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE cooler (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      kind text NOT NULL CHECK (kind IN ('couple', 'cascade')),
      name text NOT NULL,
      notes text NOT NULL DEFAULT '',
      input jsonb NOT NULL,
      case_json jsonb NOT NULL,
      created_by text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE INDEX cooler_team ON cooler (team_id, updated_at DESC)');
    await q.query(`ALTER TABLE run
      ADD COLUMN kind text NOT NULL DEFAULT 'leg' CHECK (kind IN ('leg', 'couple', 'cascade')),
      ADD COLUMN cooler_id uuid REFERENCES cooler(id) ON DELETE CASCADE,
      ADD COLUMN cooler_snapshot jsonb,
      ALTER COLUMN design_id DROP NOT NULL,
      ALTER COLUMN design_snapshot DROP NOT NULL,
      ALTER COLUMN family_version_id DROP NOT NULL`);
    // A leg run ran a design (and its family version); a couple or cascade run ran a cooler. Never both, never neither.
    await q.query(`ALTER TABLE run ADD CONSTRAINT run_kind_source CHECK (
      (kind = 'leg' AND design_id IS NOT NULL AND design_snapshot IS NOT NULL AND family_version_id IS NOT NULL AND cooler_id IS NULL)
      OR (kind IN ('couple', 'cascade') AND cooler_id IS NOT NULL AND cooler_snapshot IS NOT NULL AND design_id IS NULL AND family_version_id IS NULL))`);
    await q.query('CREATE INDEX run_cooler ON run (cooler_id, created_at DESC) WHERE cooler_id IS NOT NULL');
  }

  async down(q: QueryRunner): Promise<void> {
    // Cooler runs have no design to fall back to: they go with the table.
    await q.query(`DELETE FROM run WHERE kind <> 'leg'`);
    await q.query('DROP INDEX run_cooler');
    await q.query(`ALTER TABLE run DROP CONSTRAINT run_kind_source,
      ALTER COLUMN design_id SET NOT NULL, ALTER COLUMN design_snapshot SET NOT NULL, ALTER COLUMN family_version_id SET NOT NULL,
      DROP COLUMN cooler_snapshot, DROP COLUMN cooler_id, DROP COLUMN kind`);
    await q.query('DROP TABLE cooler');
  }
}
