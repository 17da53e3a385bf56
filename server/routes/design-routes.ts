import { designInputSchema, sweepRequestSchema, tracePageQuerySchema } from '../../shared/api';
import { designers, requireTeam, requireUser } from '../http/access';
import { objectReaders } from '../http/object-access';
import { route, type RouteSpec } from '../http/route-table';
import { body, parseOrThrow } from '../http/validate';
import { describe, findDesign, listDesigns, saveDesign, setFollowing } from '../services/design-service';
import { exportRun } from '../services/run-export';
import { cancelRun, launchRun, launchSweep, listRuns, runDetail, sweepDetail, tracePage, type RunDeps } from '../services/run-service';

export function designRoutes(d: RunDeps): RouteSpec[] {
  const { ds } = d;
  return [
    route('get', '/designs', objectReaders.design, async (req, res) => {
      res.json({ designs: await listDesigns(ds, requireTeam(req), requireUser(req).id) });
    }),
    route('post', '/designs', designers, body(designInputSchema), async (req, res) => {
      res.status(201).json({ design: await saveDesign(ds, requireTeam(req), requireUser(req), res.locals.body) });
    }),
    route('get', '/designs/:id', objectReaders.design, async (req, res) => {
      const design = await findDesign(ds.manager, requireTeam(req), req.params.id);
      res.json({ design: await describe(ds.manager, design, requireUser(req).id) });
    }),
    route('put', '/designs/:id', designers, body(designInputSchema), async (req, res) => {
      res.json({ design: await saveDesign(ds, requireTeam(req), requireUser(req), res.locals.body, req.params.id) });
    }),
    route('post', '/designs/:id/follow', objectReaders.design, async (req, res) => {
      res.json({ design: await setFollowing(ds, requireTeam(req), requireUser(req).id, req.params.id, true) });
    }),
    route('delete', '/designs/:id/follow', objectReaders.design, async (req, res) => {
      res.json({ design: await setFollowing(ds, requireTeam(req), requireUser(req).id, req.params.id, false) });
    }),
    route('post', '/designs/:id/runs', designers, async (req, res) => {
      res.status(201).json({ run: await launchRun(d, requireTeam(req), requireUser(req), req.params.id) });
    }),
    route('post', '/designs/:id/sweeps', designers, body(sweepRequestSchema), async (req, res) => {
      res.status(201).json({ sweep: await launchSweep(d, requireTeam(req), requireUser(req), req.params.id, res.locals.body) });
    }),
    route('get', '/runs', objectReaders.run, async (req, res) => {
      const { designId, sweepId, coolerId } = req.query;
      res.json({ runs: await listRuns(d, requireTeam(req), { designId, sweepId, coolerId }) });
    }),
    route('get', '/runs/:id', objectReaders.run, async (req, res) => {
      res.json(await runDetail(d, requireTeam(req), req.params.id, requireUser(req).id));
    }),
    route('get', '/runs/:id/trace', objectReaders.run, async (req, res) => {
      res.json(await tracePage(ds, requireTeam(req), req.params.id, parseOrThrow(tracePageQuerySchema, req.query)));
    }),
    route('post', '/runs/:id/cancel', designers, async (req, res) => {
      res.json({ run: await cancelRun(d, requireTeam(req), req.params.id) });
    }),
    ...(['csv', 'json'] as const).map((format) => route('get', `/runs/:id/export.${format}`, objectReaders.run, async (req, res) => {
      const out = await exportRun(ds, requireTeam(req), req.params.id, format);
      res.type(format === 'csv' ? 'text/csv' : 'application/json').attachment(out.filename).send(out.body);
    })),
    route('get', '/sweeps/:id', objectReaders.sweep, async (req, res) => {
      res.json({ sweep: await sweepDetail(d, requireTeam(req), req.params.id) });
    }),
  ];
}
