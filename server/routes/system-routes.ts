import { Router } from 'express';
import { NotFoundError } from '../http/errors';
import { checkHealth, type HealthDeps } from '../services/health-service';
import { listOutbox } from '../services/outbox-service';

export function systemRoutes(deps: HealthDeps & { mailCatcher: boolean }): Router {
  const r = Router();
  r.get('/health', async (_req, res) => {
    const health = await checkHealth(deps);
    res.status(health.status === 'ok' ? 200 : 503).json(health);
  });
  // The outbox exists only where the local catcher does (never in production).
  r.get('/outbox', async (_req, res) => {
    if (!deps.mailCatcher) throw new NotFoundError('outbox');
    res.json(await listOutbox(deps.ds));
  });
  return r;
}
