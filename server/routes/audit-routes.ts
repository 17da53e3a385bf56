import type { DataSource } from 'typeorm';
import { auditQuerySchema } from '../../shared/api/audit';
import { rolesFor } from '../../shared/api/permissions';
import { requireTeam } from '../http/access';
import { auditWho } from '../http/audit-who';
import { route, type RouteSpec } from '../http/route-table';
import { parseOrThrow } from '../http/validate';
import { auditPage, exportAudit } from '../services/audit-service';

/** The team's audit trail: admins read it a page at a time and export it. */
export function auditRoutes(ds: DataSource): RouteSpec[] {
  return [
    route('get', '/audit', rolesFor('audit.read'), async (req, res) => {
      res.json(await auditPage(ds, requireTeam(req), parseOrThrow(auditQuerySchema, req.query)));
    }),
    route('get', '/audit/export.csv', rolesFor('audit.read'), async (req, res) => {
      const out = await exportAudit(ds, requireTeam(req), auditWho(req));
      res.type('text/csv').attachment(out.filename).send(out.body);
    }),
  ];
}
