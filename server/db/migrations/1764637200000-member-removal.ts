import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Removing a member is soft: the account row stays (runs, releases and the
 * invitation list keep pointing at it, so history keeps the person's name and
 * run.launched_by / growth_order.released_by never dangle) and `removed_at`
 * marks it. Only active accounts own their e-mail address, so the address can
 * be invited again or sign up again.
 */
export class MemberRemoval1764637200000 implements MigrationInterface {
  name = 'MemberRemoval1764637200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE app_user ADD COLUMN removed_at timestamptz');
    await q.query('DROP INDEX app_user_email');
    await q.query('CREATE UNIQUE INDEX app_user_email_active ON app_user (lower(email)) WHERE removed_at IS NULL');
  }

  async down(q: QueryRunner): Promise<void> {
    // Without removed_at a removed account would be a live one again: give it an
    // address nobody owns and a password hash nothing matches, so it can
    // neither sign in nor ask for a reset, and the full unique index fits.
    await q.query(`UPDATE app_user SET email = 'removed.' || id || '@invalid', password_hash = '!removed' WHERE removed_at IS NOT NULL`);
    await q.query('DROP INDEX app_user_email_active');
    await q.query('CREATE UNIQUE INDEX app_user_email ON app_user (lower(email))');
    await q.query('ALTER TABLE app_user DROP COLUMN removed_at');
  }
}
