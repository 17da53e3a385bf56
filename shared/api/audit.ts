import { z } from 'zod';
import { isoDateTimeSchema } from './common';

/** What the audit trail records (server/audit): account events, and changes that cannot be taken back or that let data leave. */
export const auditActions = [
  'sign-in',
  'sign-in-failed',
  'signed-out-everywhere',
  'password-changed',
  'password-reset',
  'team-created',
  'invitation-sent',
  'invitation-revoked',
  'invitation-accepted',
  'role-changed',
  'member-removed',
  'order-released',
  'module-deleted',
  'cooler-deleted',
  'family-archived',
  'family-unarchived',
  'sheet-exported',
  'report-exported',
  'audit-exported',
] as const;
export const auditActionSchema = z.enum(auditActions);
export type AuditAction = z.infer<typeof auditActionSchema>;

/**
 * One event. `actor` is the member's name at the time (null when nobody was
 * signed in, as for a failed sign-in); `email` is the address the event is
 * about (tried at a failed sign-in, invited, …); `ip` the request's address.
 */
export const auditEventSchema = z.object({
  id: z.string().regex(/^\d+$/),
  at: isoDateTimeSchema,
  action: auditActionSchema,
  actor: z.string().nullable(),
  actorId: z.string().nullable(),
  email: z.string().nullable(),
  subjectId: z.string().nullable(),
  summary: z.string(),
  ip: z.string().nullable(),
});

/** `GET /api/audit?before=&limit=` — newest first; `next` is the `before` of the following page. */
export const auditPageSchema = z.object({ events: z.array(auditEventSchema), next: z.string().nullable() });
export const auditQuerySchema = z.object({
  before: z.string().regex(/^\d{1,18}$/, { error: 'before must be an event id from the previous page' }).optional(),
  limit: z.coerce.number({ error: 'limit must be a whole number' }).int({ error: 'limit must be a whole number' }).min(1, { error: 'limit is 1–200' }).max(200, { error: 'limit is 1–200' }).default(50),
});

export type AuditEvent = z.infer<typeof auditEventSchema>;
export type AuditPage = z.infer<typeof auditPageSchema>;
