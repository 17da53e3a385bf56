import type { Request } from 'express';
import type { AuditWho } from '../audit/audit-log';

/** The request's address: the client's own behind a trusted proxy (app.ts sets `trust proxy`). */
export const requestIp = (req: Request): string => req.ip ?? 'unknown';

/** The signed-in member behind a request, for the audit trail. */
export function auditWho(req: Request): AuditWho {
  const user = req.auth?.user;
  return { teamId: req.team?.id ?? user?.teamId ?? null, actorId: user?.id ?? null, actorName: user?.displayName ?? null, ip: requestIp(req) };
}
