import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Sign-up in two steps: a request (address, name, team name) waits here for
 * its mailed single-use link; only the SHA-256 hash of the link's token is
 * stored, as for invitations and resets.
 */
export class SignUpRequests1764646200000 implements MigrationInterface {
  name = 'SignUpRequests1764646200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE sign_up_request (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      email text NOT NULL,
      display_name text NOT NULL,
      team_name text NOT NULL,
      token_hash text NOT NULL UNIQUE,
      created_at timestamptz NOT NULL DEFAULT now(),
      expires_at timestamptz NOT NULL,
      used_at timestamptz)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE sign_up_request');
  }
}
