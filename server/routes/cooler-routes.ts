import type { RequestHandler } from 'express';
import { cascadeInputSchema, coolerInputSchema, coupleInputSchema } from '../../shared/api';
import { actorName, deleters, designers, launchers, requireTeam, requireUser } from '../http/access';
import { auditWho } from '../http/audit-who';
import { objectReaders } from '../http/object-access';
import { route, type RouteSpec } from '../http/route-table';
import { parseOrThrow } from '../http/validate';
import { coolerRunCsv } from '../services/cooler-csv';
import { deleteCooler, getCooler, launchCoolerRun, listCoolers, saveCooler } from '../services/cooler-service';
import type { RunDeps } from '../services/run-service';

/**
 * The body checked against its own kind's schema, so a refusal names the
 * field (`stages[0].couples`) rather than only "kind must be …", which is
 * all a union of the two can say.
 */
const coolerBody: RequestHandler = (req, res, next) => {
  const kind = (req.body as { kind?: unknown } | undefined)?.kind;
  res.locals.body = parseOrThrow(kind === 'cascade' ? cascadeInputSchema : kind === 'couple' ? coupleInputSchema : coolerInputSchema, req.body ?? {});
  next();
};

/** Matched couples and cascades: saved setups, launched as runs on the leg runs' queue; their results as CSV. */
export function coolerRoutes(d: RunDeps): RouteSpec[] {
  const { ds } = d;
  return [
    route('get', '/coolers', objectReaders.cooler, async (req, res) => {
      res.json({ coolers: await listCoolers(ds, requireTeam(req)) });
    }),
    route('post', '/coolers', designers, coolerBody, async (req, res) => {
      res.status(201).json({ cooler: await saveCooler(ds, requireTeam(req), actorName(req), res.locals.body) });
    }),
    route('get', '/coolers/:id', objectReaders.cooler, async (req, res) => {
      res.json({ cooler: await getCooler(ds, requireTeam(req), req.params.id) });
    }),
    route('put', '/coolers/:id', designers, coolerBody, async (req, res) => {
      res.json({ cooler: await saveCooler(ds, requireTeam(req), actorName(req), res.locals.body, req.params.id) });
    }),
    route('delete', '/coolers/:id', deleters, async (req, res) => {
      await deleteCooler(ds, requireTeam(req), auditWho(req), req.params.id);
      res.status(204).end();
    }),
    route('post', '/coolers/:id/runs', launchers, async (req, res) => {
      res.status(201).json({ run: await launchCoolerRun(d, requireTeam(req), requireUser(req), req.params.id) });
    }),
    ...(['cascade', 'couple'] as const).map((kind) => route('get', `/runs/:id/${kind}.csv`, objectReaders.run, async (req, res) => {
      const out = await coolerRunCsv(ds, requireTeam(req), req.params.id, kind);
      res.type('text/csv').attachment(out.filename).send(out.body);
    })),
  ];
}
