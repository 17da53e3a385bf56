import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A search start now takes tens of milliseconds, not seconds: allow up to 5000 starts per run. */
export class MoreStarts1764633600000 implements MigrationInterface {
  name = 'MoreStarts1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE design DROP CONSTRAINT design_starts_check');
    await q.query('ALTER TABLE design ADD CONSTRAINT design_starts_check CHECK (starts BETWEEN 1 AND 5000)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('UPDATE design SET starts = 500 WHERE starts > 500');
    await q.query('ALTER TABLE design DROP CONSTRAINT design_starts_check');
    await q.query('ALTER TABLE design ADD CONSTRAINT design_starts_check CHECK (starts BETWEEN 1 AND 500)');
  }
}
