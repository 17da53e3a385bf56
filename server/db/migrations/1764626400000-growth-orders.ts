import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Growth orders: a released run profile for a named batch, its computed
 * growth sheet (zoning for every K, tolerances), its state and a timeline of
 * every change, and the as-grown measurements with their prediction.
 */
export class GrowthOrders1764626400000 implements MigrationInterface {
  name = 'GrowthOrders1764626400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE growth_order (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      run_id uuid NOT NULL REFERENCES run(id),
      batch text NOT NULL,
      due_date date,
      notes text NOT NULL DEFAULT '',
      state text NOT NULL DEFAULT 'requested' CHECK (state IN ('requested', 'accepted', 'growing', 'grown', 'measured', 'approved', 'rejected')),
      close_reason text,
      zones integer NOT NULL DEFAULT 3 CHECK (zones BETWEEN 1 AND 12),
      loss_budget double precision NOT NULL DEFAULT 1 CHECK (loss_budget > 0),
      measure_temperature double precision NOT NULL DEFAULT 300,
      sheet_status text NOT NULL DEFAULT 'computing' CHECK (sheet_status IN ('computing', 'ready', 'failed')),
      sheet jsonb,
      sheet_error text,
      released_by text NOT NULL REFERENCES app_user(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE INDEX growth_order_team ON growth_order (team_id, created_at DESC)');
    await q.query(`CREATE TABLE growth_event (
      id bigserial PRIMARY KEY,
      order_id uuid NOT NULL REFERENCES growth_order(id) ON DELETE CASCADE,
      at timestamptz NOT NULL DEFAULT now(),
      by_user text NOT NULL,
      kind text NOT NULL,
      from_state text,
      to_state text,
      note text NOT NULL DEFAULT '')`);
    await q.query('CREATE INDEX growth_event_order ON growth_event (order_id, at)');
    await q.query(`CREATE TABLE growth_measurement (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      order_id uuid NOT NULL REFERENCES growth_order(id) ON DELETE CASCADE,
      uploaded_by text NOT NULL,
      uploaded_at timestamptz NOT NULL DEFAULT now(),
      temperature double precision NOT NULL,
      points jsonb NOT NULL,
      prediction jsonb NOT NULL)`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['growth_measurement', 'growth_event', 'growth_order']) await q.query(`DROP TABLE ${t}`);
  }
}
