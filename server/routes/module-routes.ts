import { moduleCsvQuerySchema, moduleInputSchema } from '../../shared/api';
import { actorName, designers, requireTeam } from '../http/access';
import { auditWho } from '../http/audit-who';
import { objectReaders } from '../http/object-access';
import { route, type RouteSpec } from '../http/route-table';
import { body, parseOrThrow } from '../http/validate';
import { deleteModule, getModule, listModules, moduleCurvesCsv, saveModule } from '../services/module-service';
import type { DataSource } from 'typeorm';

/** Saved couples and modules; their curves are computed by the engine (in the browser, or here for CSV). */
export function moduleRoutes(ds: DataSource): RouteSpec[] {
  return [
    route('get', '/modules', objectReaders.module, async (req, res) => {
      res.json({ modules: await listModules(ds, requireTeam(req)) });
    }),
    route('post', '/modules', designers, body(moduleInputSchema), async (req, res) => {
      res.status(201).json({ module: await saveModule(ds, requireTeam(req), actorName(req), res.locals.body) });
    }),
    route('get', '/modules/:id', objectReaders.module, async (req, res) => {
      res.json({ module: await getModule(ds, requireTeam(req), req.params.id) });
    }),
    route('put', '/modules/:id', designers, body(moduleInputSchema), async (req, res) => {
      res.json({ module: await saveModule(ds, requireTeam(req), actorName(req), res.locals.body, req.params.id) });
    }),
    route('delete', '/modules/:id', designers, async (req, res) => {
      await deleteModule(ds, requireTeam(req), auditWho(req), req.params.id);
      res.status(204).end();
    }),
    route('get', '/modules/:id/curves.csv', objectReaders.module, async (req, res) => {
      const { versus } = parseOrThrow(moduleCsvQuerySchema, req.query);
      const out = await moduleCurvesCsv(ds, requireTeam(req), req.params.id, versus);
      res.type('text/csv').attachment(out.filename).send(out.body);
    }),
  ];
}
