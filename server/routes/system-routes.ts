import type { Request } from 'express';
import { rolesFor } from '../../shared/api/permissions';
import { requireTeam } from '../http/access';
import { NotFoundError } from '../http/errors';
import { isLocalOperator } from '../http/local-operator';
import { route, type RouteSpec } from '../http/route-table';
import { healthChecker, healthFor, type HealthAudience, type HealthDeps } from '../services/health-service';
import { listOutbox } from '../services/outbox-service';

/**
 * Checks describe the installation, not a team: the local operator reads
 * them whole, any team's admin without the machines' names (anyone who signs
 * up is the admin of a team of their own, so that is not a trusted circle).
 */
function audience(req: Request): HealthAudience {
  if (isLocalOperator(req)) return 'operator';
  if (req.auth?.user.role === 'admin') return 'details';
  return req.auth ? 'member' : 'anyone';
}

export function systemRoutes(deps: HealthDeps & { mailCatcher: boolean }): RouteSpec[] {
  const checkHealth = healthChecker(deps);
  return [
    // Public on purpose: load balancers and the start script poll it. Strangers learn ok or degraded, nothing more.
    route('get', '/health', 'public', async (req, res) => {
      const health = await checkHealth();
      // The body depends on who asks: no shared cache may hand one caller's answer to another.
      res.set('Cache-Control', 'no-store').vary('Cookie');
      res.status(health.status === 'ok' ? 200 : 503).json(healthFor(health, audience(req)));
    }),
    // The outbox exists only where the local catcher does (never in production).
    route('get', '/outbox', rolesFor('outbox.read'), async (req, res) => {
      if (!deps.mailCatcher) throw new NotFoundError('outbox');
      res.json(await listOutbox(deps.ds, requireTeam(req)));
    }),
  ];
}
