import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What a waiting run needs for "no run is ever stranded" and fair sharing:
 * the pg-boss job that will start it (job_id; checked by the sweeper), when
 * it last entered the queue and when it may start (queued_at, eligible_at),
 * its place among other teams' runs (queue_priority, as given to pg-boss),
 * and why it waits when that is not simply its turn (wait_reason).
 */
export class RunQueue1764640800000 implements MigrationInterface {
  name = 'RunQueue1764640800000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE run
      ADD COLUMN job_id uuid,
      ADD COLUMN queued_at timestamptz,
      ADD COLUMN eligible_at timestamptz,
      ADD COLUMN queue_priority integer NOT NULL DEFAULT 0,
      ADD COLUMN wait_reason text CHECK (wait_reason IN ('team-limit', 'yielded', 'resumed'))`);
    await q.query(`UPDATE run SET queued_at = created_at, eligible_at = created_at WHERE state = 'queued'`);
    await q.query(`CREATE INDEX run_waiting ON run (queue, queue_priority DESC, queued_at) WHERE state = 'queued'`);
    await q.query(`CREATE INDEX run_team_active ON run (team_id, queue) WHERE state IN ('queued', 'running')`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP INDEX run_team_active');
    await q.query('DROP INDEX run_waiting');
    await q.query('ALTER TABLE run DROP COLUMN job_id, DROP COLUMN queued_at, DROP COLUMN eligible_at, DROP COLUMN queue_priority, DROP COLUMN wait_reason');
  }
}
