import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A short number per team for every run ("Run 12"), so people can tell two
 * runs of one design apart in lists and pickers. The team keeps the last
 * number it gave out: a launch takes the next one by updating that row, which
 * locks it until the launch commits, so two launches at once get distinct
 * numbers and a number is never given twice. Existing runs are numbered per
 * team in launch order.
 */
export class RunNumbers1764655200000 implements MigrationInterface {
  name = 'RunNumbers1764655200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE team ADD COLUMN last_run_number integer NOT NULL DEFAULT 0');
    await q.query('ALTER TABLE run ADD COLUMN number integer');
    await q.query(`UPDATE run SET number = n.k FROM (
      SELECT id, row_number() OVER (PARTITION BY team_id ORDER BY created_at, id) AS k FROM run) n WHERE run.id = n.id`);
    await q.query('UPDATE team SET last_run_number = coalesce((SELECT max(number) FROM run WHERE run.team_id = team.id), 0)');
    await q.query('ALTER TABLE run ALTER COLUMN number SET NOT NULL, ADD CONSTRAINT run_team_number_unique UNIQUE (team_id, number)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE run DROP CONSTRAINT run_team_number_unique, DROP COLUMN number');
    await q.query('ALTER TABLE team DROP COLUMN last_run_number');
  }
}
