import type { AuditAction } from '@/shared/api/audit';

/** Each kind of audit event in a few words, for the trail's tag. */
export const auditActionLabels: Record<AuditAction, string> = {
  'sign-in': 'Signed in',
  'sign-in-failed': 'Sign-in refused',
  'signed-out-everywhere': 'Signed out everywhere',
  'password-changed': 'Password changed',
  'password-reset': 'Password reset',
  'team-created': 'Team created',
  'invitation-sent': 'Invited',
  'invitation-revoked': 'Invitation revoked',
  'invitation-accepted': 'Joined',
  'role-changed': 'Role changed',
  'member-removed': 'Member removed',
  'order-released': 'Released',
  'module-deleted': 'Module deleted',
  'cooler-deleted': 'Cooler deleted',
  'family-archived': 'Family archived',
  'family-unarchived': 'Family restored',
  'sheet-exported': 'Sheet exported',
  'report-exported': 'Report exported',
  'audit-exported': 'Trail exported',
};

/** Events worth a second look get the warm tag: refusals and what cannot be undone. */
export const auditWarnings: ReadonlySet<AuditAction> = new Set(['sign-in-failed', 'member-removed', 'module-deleted', 'cooler-deleted', 'signed-out-everywhere', 'password-reset']);
