import { z } from 'zod';
import type { Role } from '../../shared/api';
import { closeOrderSchema, growthStateChangeSchema, hallFactorSchema, releaseRequestSchema, sheetSettingsSchema, yieldSettingsSchema } from '../../shared/api';
import { rolesFor } from '../../shared/api/permissions';
import { designers, requireTeam, requireUser } from '../http/access';
import { auditWho } from '../http/audit-who';
import { objectReaders } from '../http/object-access';
import { recordAudit } from '../audit/audit-log';
import { route, type RouteSpec } from '../http/route-table';
import { fileOf, uploadThen } from '../http/upload';
import { body, parseOrThrow } from '../http/validate';
import { exportReport, exportSheet } from '../services/growth-export';
import { changeState, closeOrder, listOrders, orderDetail, releaseRun, updateScatter, updateSheetSettings, uploadMeasurements, type GrowthDeps } from '../services/growth-service';

/** Growers move orders and upload measurements; admins may stand in for them. */
export const growers: readonly Role[] = rolesFor('growth.update');
/** Who may set the doping scatter behind the yield. */
const scatterSetters: readonly Role[] = rolesFor('growth.scatter');

/** The upload's form fields beside the file; an empty hallFactor means "the band model's". */
const uploadFields = z.object({
  temperature: z.coerce.number({ error: 'temperature must be a number (K)' }).min(200, { error: 'temperature is in kelvin (200–400 K)' }).max(400, { error: 'temperature is in kelvin (200–400 K)' }).optional(),
  hallFactor: z.preprocess((v) => (v === '' ? undefined : v), hallFactorSchema.optional()),
});

export function growthRoutes(d: GrowthDeps): RouteSpec[] {
  const { ds } = d;
  return [
    route('post', '/runs/:id/release', designers, body(releaseRequestSchema), async (req, res) => {
      res.status(201).json({ order: await releaseRun(d, requireTeam(req), requireUser(req), auditWho(req), req.params.id, res.locals.body) });
    }),
    route('get', '/growth-orders', objectReaders.growth, async (req, res) => {
      res.json({ orders: await listOrders(ds, requireTeam(req)) });
    }),
    route('get', '/growth-orders/:id', objectReaders.growth, async (req, res) => {
      res.json(await orderDetail(ds, requireTeam(req), req.params.id));
    }),
    route('put', '/growth-orders/:id/state', growers, body(growthStateChangeSchema), async (req, res) => {
      await changeState(ds, requireTeam(req), requireUser(req), req.params.id, res.locals.body);
      res.json(await orderDetail(ds, requireTeam(req), req.params.id));
    }),
    route('post', '/growth-orders/:id/close', designers, body(closeOrderSchema), async (req, res) => {
      await closeOrder(d, requireTeam(req), requireUser(req), req.params.id, res.locals.body);
      res.json(await orderDetail(ds, requireTeam(req), req.params.id));
    }),
    route('put', '/growth-orders/:id/sheet', designers, body(sheetSettingsSchema), async (req, res) => {
      await updateSheetSettings(d, requireTeam(req), requireUser(req), req.params.id, res.locals.body);
      res.json(await orderDetail(ds, requireTeam(req), req.params.id));
    }),
    // The grower knows the scatter of their growth; the physicist may set it too.
    route('put', '/growth-orders/:id/yield', scatterSetters, body(yieldSettingsSchema), async (req, res) => {
      await updateScatter(d, requireTeam(req), requireUser(req), req.params.id, res.locals.body);
      res.json(await orderDetail(ds, requireTeam(req), req.params.id));
    }),
    route('post', '/growth-orders/:id/measurements', growers, uploadThen(async (req) => {
      const { temperature, hallFactor } = parseOrThrow(uploadFields, req.body ?? {});
      return { report: await uploadMeasurements(d, requireTeam(req), requireUser(req), req.params.id, () => fileOf(req), temperature, hallFactor) };
    }, 201)),
    ...(['csv', 'json'] as const).map((format) => route('get', `/growth-orders/:id/sheet.${format}`, objectReaders.growth, async (req, res) => {
      const out = await exportSheet(ds, requireTeam(req), req.params.id, format);
      // Recorded before the sheet leaves: no export goes unrecorded.
      await recordAudit(ds, auditWho(req), { action: 'sheet-exported', summary: `exported the growth sheet ${out.filename}`, subjectId: String(req.params.id) });
      res.type(format === 'csv' ? 'text/csv' : 'application/json').attachment(out.filename).send(out.body);
    })),
    // The newest upload's report, or the one named by `?upload=<id>`: each position's readings and verdicts.
    route('get', '/growth-orders/:id/report.csv', objectReaders.growth, async (req, res) => {
      const out = await exportReport(ds, requireTeam(req), req.params.id, typeof req.query.upload === 'string' ? req.query.upload : undefined);
      await recordAudit(ds, auditWho(req), { action: 'report-exported', summary: `exported the measurement report ${out.filename}`, subjectId: String(req.params.id) });
      res.type('text/csv').attachment(out.filename).send(out.body);
    }),
  ];
}
