import type { Role } from './auth';

/**
 * What a team member may do, by role (DESIGN.md, "Roles"): the one table.
 * The server's route table takes its roles from here (server/http/access.ts,
 * server/http/object-access.ts), the shell hides tabs a role may not read,
 * and screens hide or freeze what a role may not change — so nobody meets a
 * button or a page that would answer "Forbidden".
 */
export const actionRoles = {
  /** Create, edit, duplicate, archive material families; upload measured tables. */
  'families.write': ['admin', 'physicist'],
  /** Create and edit leg and module designs. */
  'designs.write': ['admin', 'physicist'],
  /** Launch and cancel optimisation runs. */
  'runs.launch': ['admin', 'physicist'],
  /** Release a converged profile to the growers. */
  'profiles.release': ['admin', 'physicist'],
  /** Move a growth sheet along (grown, measured, …). */
  'growth.update': ['admin', 'grower'],
  /** Upload as-grown measurements of a leg. */
  'measurements.upload': ['admin', 'grower'],
  /** Set the doping scatter behind a growth sheet's yield (the grower knows it; the physicist may set it). */
  'growth.scatter': ['admin', 'physicist', 'grower'],
  /** Invite members, change roles, remove members, revoke invitations. */
  'team.manage': ['admin'],
  /** Delete records for good (only admins delete). */
  'records.delete': ['admin'],
  /** Read the captured e-mail of the workspace. */
  'outbox.read': ['admin'],
  /** Read and export the team's audit trail. */
  'audit.read': ['admin'],
  /** Read material families (everyone of the team). */
  'families.read': ['admin', 'physicist', 'grower', 'viewer'],
  /** Read designs, runs, sweeps and modules: the physicists' work; growers see released profiles through growth orders. */
  'designs.read': ['admin', 'physicist', 'viewer'],
  /** Read growth orders and their sheets (everyone of the team). */
  'growth.read': ['admin', 'physicist', 'grower', 'viewer'],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof actionRoles;

/** The roles that may take `action`, for the server's route table. */
export function rolesFor(action: Action): readonly Role[] {
  return actionRoles[action];
}

/** True when `role` may take `action`; nobody signed in may take none. */
export function roleCan(role: Role | null | undefined, action: Action): boolean {
  if (!role) return false;
  return (actionRoles[action] as readonly Role[]).includes(role);
}
