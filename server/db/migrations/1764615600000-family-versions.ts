import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Families get immutable versions: the definition, summary and source move to
 * material_family_version, and a trigger refuses any UPDATE of a version row,
 * so a run that points at a version always finds exactly what it used.
 */
export class FamilyVersions1764615600000 implements MigrationInterface {
  name = 'FamilyVersions1764615600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE material_family_version (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      family_id uuid NOT NULL REFERENCES material_family(id) ON DELETE CASCADE,
      version integer NOT NULL CHECK (version >= 1),
      definition jsonb NOT NULL,
      summary text NOT NULL DEFAULT '',
      source text NOT NULL DEFAULT '',
      created_by text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (family_id, version))`);
    await q.query(`INSERT INTO material_family_version (family_id, version, definition, summary, source, created_by, created_at)
      SELECT id, 1, definition, summary, source, created_by, created_at FROM material_family`);
    await q.query(`ALTER TABLE material_family
      DROP COLUMN definition, DROP COLUMN summary, DROP COLUMN source,
      ADD COLUMN current_version integer NOT NULL DEFAULT 1,
      ADD COLUMN archived boolean NOT NULL DEFAULT false,
      ADD COLUMN updated_at timestamptz NOT NULL DEFAULT now()`);
    await q.query(`CREATE UNIQUE INDEX material_family_team_name_unique ON material_family (team_id, lower(name))`);
    await q.query(`CREATE FUNCTION material_family_version_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'material family versions are immutable: write a new version'; END $$`);
    await q.query(`CREATE TRIGGER material_family_version_no_update BEFORE UPDATE ON material_family_version
      FOR EACH ROW EXECUTE FUNCTION material_family_version_immutable()`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TRIGGER material_family_version_no_update ON material_family_version');
    await q.query('DROP FUNCTION material_family_version_immutable()');
    await q.query('DROP INDEX material_family_team_name_unique');
    await q.query(`ALTER TABLE material_family
      ADD COLUMN definition jsonb, ADD COLUMN summary text NOT NULL DEFAULT '', ADD COLUMN source text NOT NULL DEFAULT ''`);
    await q.query(`UPDATE material_family f SET definition = v.definition, summary = v.summary, source = v.source
      FROM material_family_version v WHERE v.family_id = f.id AND v.version = f.current_version`);
    await q.query('ALTER TABLE material_family ALTER COLUMN definition SET NOT NULL, DROP COLUMN current_version, DROP COLUMN archived, DROP COLUMN updated_at');
    await q.query('DROP TABLE material_family_version');
  }
}
