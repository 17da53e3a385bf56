import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Designs, their followers, runs (a frozen case and family version each),
 * each run's progress trace, and sweeps. A run is claimed by one worker at a
 * time (worker_id, heartbeat_at); only that worker may finish it.
 */
export class DesignsAndRuns1764622800000 implements MigrationInterface {
  name = 'DesignsAndRuns1764622800000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE design (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      name text NOT NULL,
      notes text NOT NULL DEFAULT '',
      family_id uuid NOT NULL REFERENCES material_family(id),
      family_version integer NOT NULL,
      length_mm double precision NOT NULL,
      area_mm2 double precision NOT NULL,
      hot_side double precision NOT NULL,
      objective text NOT NULL CHECK (objective IN ('maxDeltaT', 'maxHeatLoad', 'maxCop')),
      heat_load double precision NOT NULL DEFAULT 0,
      cold_side double precision,
      min_per_cm3 double precision NOT NULL,
      max_per_cm3 double precision NOT NULL,
      control_points integer NOT NULL,
      monotone boolean NOT NULL DEFAULT false,
      starts integer NOT NULL DEFAULT 16 CHECK (starts BETWEEN 1 AND 500),
      min_zone_mm double precision NOT NULL DEFAULT 0,
      created_by text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE INDEX design_team ON design (team_id)');
    await q.query(`CREATE TABLE design_follower (
      design_id uuid NOT NULL REFERENCES design(id) ON DELETE CASCADE,
      user_id text NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
      PRIMARY KEY (design_id, user_id))`);
    await q.query(`CREATE TABLE sweep (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      design_id uuid NOT NULL REFERENCES design(id) ON DELETE CASCADE,
      parameter text NOT NULL,
      "values" jsonb NOT NULL,
      created_by text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now())`);
    await q.query(`CREATE TABLE run (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      team_id uuid NOT NULL REFERENCES team(id) ON DELETE CASCADE,
      design_id uuid NOT NULL REFERENCES design(id) ON DELETE CASCADE,
      design_snapshot jsonb NOT NULL,
      family_version_id uuid NOT NULL REFERENCES material_family_version(id),
      sweep_id uuid REFERENCES sweep(id) ON DELETE CASCADE,
      sweep_value double precision,
      case_json jsonb NOT NULL,
      objective text NOT NULL,
      state text NOT NULL DEFAULT 'queued' CHECK (state IN ('queued', 'running', 'succeeded', 'failed', 'cancelled')),
      queue text NOT NULL,
      launched_by text NOT NULL REFERENCES app_user(id),
      created_at timestamptz NOT NULL DEFAULT now(),
      started_at timestamptz,
      finished_at timestamptz,
      worker_id text,
      heartbeat_at timestamptz,
      attempts integer NOT NULL DEFAULT 0,
      cancel_requested boolean NOT NULL DEFAULT false,
      progress jsonb,
      checkpoint jsonb,
      checkpoint_at timestamptz,
      result jsonb,
      error text,
      engine_version text NOT NULL)`);
    await q.query('CREATE INDEX run_team_created ON run (team_id, created_at DESC)');
    await q.query('CREATE INDEX run_design ON run (design_id)');
    await q.query(`CREATE INDEX run_stale ON run (heartbeat_at) WHERE state = 'running'`);
    await q.query(`CREATE TABLE run_trace (
      run_id uuid NOT NULL REFERENCES run(id) ON DELETE CASCADE,
      iteration integer NOT NULL,
      objective double precision NOT NULL,
      best double precision NOT NULL,
      seconds double precision NOT NULL,
      at timestamptz NOT NULL DEFAULT now())`);
    await q.query('CREATE INDEX run_trace_run ON run_trace (run_id, at)');
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['run_trace', 'run', 'sweep', 'design_follower', 'design']) await q.query(`DROP TABLE ${t}`);
  }
}
