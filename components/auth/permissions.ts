import type { Role } from '@/shared/api/auth';

/**
 * What a team member may do, by role. The table itself lives in
 * `shared/api/permissions.ts` so the server's route table uses the same one;
 * this module adds the words the client shows.
 *
 * Use it through `useRole()` (components/auth/session.tsx):
 *
 *   const { can } = useRole();
 *   {can('families.write') ? <LinkButton label="New band-model family" … /> : null}
 *
 * or wrap the action: `<Can action="families.write">…</Can>`.
 */
export { actionRoles, roleCan, type Action } from '@/shared/api/permissions';

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
