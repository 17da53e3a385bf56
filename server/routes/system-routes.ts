import { admins, requireTeam } from '../http/access';
import { NotFoundError } from '../http/errors';
import { route, type RouteSpec } from '../http/route-table';
import { checkHealth, type HealthDeps } from '../services/health-service';
import { listOutbox } from '../services/outbox-service';

export function systemRoutes(deps: HealthDeps & { mailCatcher: boolean }): RouteSpec[] {
  return [
    // Public on purpose: load balancers and the start script poll it. It names no team data.
    route('get', '/health', 'public', async (_req, res) => {
      const health = await checkHealth(deps);
      res.status(health.status === 'ok' ? 200 : 503).json(health);
    }),
    // The outbox exists only where the local catcher does (never in production).
    route('get', '/outbox', admins, async (req, res) => {
      if (!deps.mailCatcher) throw new NotFoundError('outbox');
      res.json(await listOutbox(deps.ds, requireTeam(req)));
    }),
  ];
}
