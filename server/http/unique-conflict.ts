import type { FieldError } from './errors';

/**
 * Every unique index of the schema (server/db/migrations) and the request
 * field it guards. A check-then-insert in a service answers the common case
 * with a friendly message; two requests racing past the check meet here, at
 * the index, and the loser gets the same 409 naming the field instead of a 500.
 * tests/server/conflicts.test.ts fails when an index is missing from this table.
 */
export const uniqueFields: Record<string, FieldError> = {
  team_slug_key: { field: 'teamName', message: 'another team took this address at the same moment: try again' },
  material_family_team_name_unique: { field: 'name', message: 'another family of the team has this name' },
  material_family_version_family_id_version_key: { field: 'version', message: 'the family changed at the same moment: reload it and try again' },
  app_user_email_active: { field: 'email', message: 'this address already has a Frostgrade account (one team per account)' },
  invitation_token_hash_key: { field: 'token', message: 'a link collided with an existing one: try again' },
  password_reset_token_hash_key: { field: 'token', message: 'a link collided with an existing one: try again' },
  // Numbers come from the team's counter under its row lock; a clash would be a bug, but answers like one.
  run_team_number_unique: { field: 'run', message: 'another run took this number at the same moment: launch again' },
  sign_up_request_token_hash_key: { field: 'token', message: 'a link collided with an existing one: try again' },
};

/** Primary keys are generated or written idempotently; a clash there is a retryable collision on `id`. */
const primaryKey: FieldError = { field: 'id', message: 'this record was created at the same moment by another request: try again' };

/**
 * The field behind PostgreSQL's unique_violation (23505), as pg raises it or
 * TypeORM wraps it (QueryFailedError.driverError); null for any other error
 * or an index not in the table (then a 500 is logged: a bug to look at).
 */
export function uniqueConflict(err: unknown): FieldError | null {
  if (typeof err !== 'object' || err === null) return null;
  const driver = (err as { driverError?: unknown }).driverError ?? err;
  const { code, constraint } = driver as { code?: unknown; constraint?: unknown };
  if (code !== '23505' || typeof constraint !== 'string') return null;
  return uniqueFields[constraint] ?? (constraint.endsWith('_pkey') ? primaryKey : null);
}
