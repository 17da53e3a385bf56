import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The grower's typical doping scatter per zone (decades, 1σ) for the sheet's
 * yield estimate, and how far a sheet or yield job has got (0…1; null when
 * no job is computing) so the screen can show its progress.
 */
export class GrowthYield1764651600000 implements MigrationInterface {
  name = 'GrowthYield1764651600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE growth_order ADD COLUMN doping_scatter double precision NOT NULL DEFAULT 0.05, ADD COLUMN sheet_progress double precision');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE growth_order DROP COLUMN sheet_progress, DROP COLUMN doping_scatter');
  }
}
