import type { Role } from '@/shared/api/auth';

/**
 * What a team member may do, by role (DESIGN.md, "Roles"). The API's route
 * table is the authority; this mirror only decides what the client shows,
 * so nobody meets a button that would answer "Forbidden".
 *
 * Use it through `useRole()` (components/auth/session.tsx):
 *
 *   const { can } = useRole();
 *   {can('families.write') ? <LinkButton label="New band-model family" … /> : null}
 *
 * or wrap the action: `<Can action="families.write">…</Can>`.
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
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof actionRoles;

/** True when `role` may take `action`; nobody signed in may take none. */
export function roleCan(role: Role | null | undefined, action: Action): boolean {
  if (!role) return false;
  return (actionRoles[action] as readonly Role[]).includes(role);
}

/** A role in words, for badges and pickers. */
export const roleLabels: Record<Role, string> = {
  admin: 'Admin',
  physicist: 'Physicist',
  grower: 'Grower',
  viewer: 'Viewer',
};

/** One line on what each role may do, shown beside the role picker. */
export const roleSummaries: Record<Role, string> = {
  admin: 'Everything, plus inviting, changing roles and deleting',
  physicist: 'Families, designs and runs; releases profiles',
  grower: 'Released profiles and growth sheets; uploads as-grown measurements',
  viewer: 'Reads everything of the team, changes nothing',
};
