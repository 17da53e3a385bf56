import type { Role } from '../../shared/api/auth';
import { rolesFor } from '../../shared/api/permissions';

/** Designs and runs are the physicists' work; growers see released profiles only (growth orders). */
export const runReaders: readonly Role[] = rolesFor('designs.read');

/**
 * Who may read each kind of team object. The route table's reading routes
 * (server/routes) and the socket watch rules (server/realtime/watch-rules.ts)
 * both take their roles from here, so one change moves both; the access
 * matrix test and tests/server/watch-access.test.ts hold them to it.
 */
export const objectReaders = {
  family: rolesFor('families.read'),
  design: runReaders,
  run: runReaders,
  sweep: runReaders,
  module: runReaders,
  cooler: runReaders,
  growth: rolesFor('growth.read'),
} as const satisfies Record<string, readonly Role[]>;

export type ObjectKind = keyof typeof objectReaders;
