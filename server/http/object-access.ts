import type { Role } from '../../shared/api/auth';
import { anyMember } from './access';

/** Designs and runs are the physicists' work; growers see released profiles only (growth orders). */
export const runReaders: readonly Role[] = ['admin', 'physicist', 'viewer'];

/**
 * Who may read each kind of team object. The route table's reading routes
 * (server/routes) and the socket watch rules (server/realtime/watch-rules.ts)
 * both take their roles from here, so one change moves both; the access
 * matrix test and tests/server/watch-access.test.ts hold them to it.
 */
export const objectReaders = {
  family: anyMember,
  design: runReaders,
  run: runReaders,
  sweep: runReaders,
  module: runReaders,
  growth: anyMember,
} as const satisfies Record<string, readonly Role[]>;

export type ObjectKind = keyof typeof objectReaders;
