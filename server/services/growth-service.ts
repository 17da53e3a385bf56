import { join } from 'node:path';
import type PgBoss from 'pg-boss';
import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { GrowthOrderDetail, GrowthOrderDto, closeOrderSchema, growthStateChangeSchema, releaseRequestSchema, sheetSettingsSchema, yieldSettingsSchema } from '../../shared/api';
import { growerStates } from '../../shared/api';
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import { stepBlocker } from '../../shared/growth/order-steps';
import { inApiThread } from './api-threads';
import type { ReportThreadAnswer, ReportThreadInput } from './report-thread';
import { recordAudit, type AuditWho } from '../audit/audit-log';
import { GrowthOrder, Run, Team } from '../db/entities';
import { HttpError, NotFoundError, ValidationError } from '../http/errors';
import { isUuid } from '../http/validate';
import type { Mailer } from '../mail/mailer';
import { enqueueGrowthMail } from '../queue/growth-mail-queue';
import { queues } from '../queue/queues';
import { publishEvent } from '../db/events';
import { findRun } from './run-service';
import { runName } from './run-summary';
import { uploadText } from './family-upload-service';

export type GrowthDeps = { ds: DataSource; boss: PgBoss; mailer: Mailer; appOrigin: string };
type Actor = { id: string; displayName: string };

export async function findOrder(m: EntityManager, team: Team, id: unknown, lock = false): Promise<GrowthOrder> {
  if (!isUuid(id)) throw new NotFoundError('growth order');
  const qb = m.getRepository(GrowthOrder).createQueryBuilder('o').where('o.id = :id AND o.teamId = :team', { id, team: team.id });
  if (lock) qb.setLock('pessimistic_write');
  const o = await qb.getOne();
  if (!o) throw new NotFoundError('growth order');
  return o;
}

/**
 * An approved or rejected order is a record: no step, verdict, sheet change
 * or upload changes it any more (a regrowth is a new release).
 */
function assertOpen(o: GrowthOrder): void {
  if (o.state === 'approved' || o.state === 'rejected') {
    throw new HttpError(409, `The order is closed (${o.state}); a closed order no longer changes — release the run again for a new batch.`, [{ field: 'state', message: `closed: ${o.state}` }], 'Conflict');
  }
}

/** The yield is being recomputed while the stored sheet's scatter is not the order's; a failed yield job leaves its reason in sheetError. */
function yieldStatus(o: GrowthOrder): GrowthOrderDto['yieldStatus'] {
  if (o.sheetStatus !== 'ready') return o.sheetStatus;
  if (o.sheetError) return 'failed';
  const scatter = (o.sheet as { dopingScatter?: unknown } | null)?.dopingScatter;
  return scatter === o.dopingScatter ? 'ready' : 'computing';
}

type RunNamed = { designName: string; runNumber: number };

function dto(o: GrowthOrder, { designName, runNumber }: RunNamed, releasedBy: string): GrowthOrderDto {
  return {
    runNumber,
    dopingScatter: o.dopingScatter, yieldStatus: yieldStatus(o), sheetProgress: o.sheetProgress,
    id: o.id, runId: o.runId, designName, batch: o.batch, dueDate: o.dueDate, notes: o.notes, state: o.state, closeReason: o.closeReason,
    zones: o.zones, lossBudget: o.lossBudget, measureTemperature: o.measureTemperature, sheetStatus: o.sheetStatus, sheetError: o.sheetError,
    releasedBy, createdAt: o.createdAt.toISOString(), updatedAt: o.updatedAt.toISOString(),
  };
}

async function event(m: EntityManager, orderId: string, by: string, kind: string, from: string | null, to: string | null, note = ''): Promise<void> {
  await m.query('INSERT INTO growth_event (order_id, by_user, kind, from_state, to_state, note) VALUES ($1, $2, $3, $4, $5, $6)', [orderId, by, kind, from, to, note]);
}

const sendSheetJob = (boss: PgBoss, m: EntityManager, orderId: string, kind: 'sheet' | 'yield' = 'sheet') =>
  boss.send(queues.growthSheet, { orderId, kind }, { db: { executeSql: async (text: string, values: unknown[]) => ({ rows: await m.query(text, values) }) } });

async function mailRoles(ds: DataSource, team: Team, roles: string[]): Promise<string[]> {
  const rows: Array<{ email: string }> = await ds.query('SELECT email FROM app_user WHERE team_id = $1 AND role = ANY($2) AND removed_at IS NULL', [team.id, roles]);
  return rows.map((r) => r.email);
}

/** A converged run's profile becomes a growth order; its sheet is computed by a worker. */
export async function releaseRun(d: GrowthDeps, team: Team, actor: Actor, who: AuditWho, runId: unknown, input: z.output<typeof releaseRequestSchema>): Promise<GrowthOrderDto> {
  const order = await d.ds.transaction(async (m) => {
    const run = await findRun(m, team, runId);
    if (run.kind !== 'leg') {
      // A couple or cascade has several legs and no one profile: each leg is grown from its own leg run.
      throw new HttpError(409, `A ${run.kind} run is not released to growth: release the leg runs its legs came from instead.`, [{ field: 'runId', message: `the run is a ${run.kind} run, not a leg run` }], 'Conflict');
    }
    const result = run.result as { doping?: unknown } | null;
    if (run.state !== 'succeeded' || !result?.doping) {
      throw new HttpError(409, 'Only a converged run with a doping profile can be released.', [{ field: 'runId', message: `the run is ${run.state}` }], 'Conflict');
    }
    const o = await m.getRepository(GrowthOrder).save(m.getRepository(GrowthOrder).create({ ...input, dueDate: input.dueDate ?? null, teamId: team.id, runId: run.id, releasedBy: actor.id, state: 'requested', sheetStatus: 'computing' }));
    await event(m, o.id, actor.displayName, 'released', null, 'requested', input.notes);
    await sendSheetJob(d.boss, m, o.id);
    await recordAudit(m, who, { action: 'order-released', summary: `released run ${run.id.slice(0, 8)} of ${runName(run)} to growth as batch ${o.batch}`, subjectId: o.id });
    return { o, designName: runName(run), runNumber: run.number };
  });
  const growers = await mailRoles(d.ds, team, ['grower']);
  if (growers.length > 0) {
    await d.mailer.send({
      to: growers,
      subject: `Growth order ${order.o.batch}: ${order.designName}`,
      text: [`${actor.displayName} released a doping profile for batch ${order.o.batch}${order.o.dueDate ? `, due ${order.o.dueDate}` : ''}.`, '',
        `Growth sheet (zones, target carrier concentrations, tolerances, room-temperature checks): ${d.appOrigin}/growth/${order.o.id}`, '',
        'The targets are model predictions: verify the grown piece by measurement and follow your lab\'s safety rules.'].join('\n'),
    }).catch((err: Error) => console.error(`[api] release mail failed: ${err.message}`));
  }
  await publishEvent(d.ds, { teamId: team.id, event: 'growth:changed', payload: { orderId: order.o.id } });
  return dto(order.o, order, actor.displayName);
}

/** Who released each order: history, so a member since removed keeps their name. */
async function withNames(m: EntityManager, orders: GrowthOrder[]): Promise<GrowthOrderDto[]> {
  if (orders.length === 0) return [];
  const runs: Array<{ id: string; name: string; number: number }> = await m.query(`SELECT id, design_snapshot->>'name' AS name, number FROM run WHERE id = ANY($1)`, [orders.map((o) => o.runId)]);
  const users: Array<{ id: string; display_name: string }> = await m.query('SELECT id, display_name FROM app_user WHERE id = ANY($1)', [orders.map((o) => o.releasedBy)]);
  const runName = new Map(runs.map((r): [string, RunNamed] => [r.id, { designName: r.name, runNumber: r.number }]));
  const userName = new Map(users.map((u) => [u.id, u.display_name]));
  return orders.map((o) => dto(o, runName.get(o.runId) ?? { designName: '', runNumber: 0 }, userName.get(o.releasedBy) ?? 'a former member'));
}

export async function listOrders(ds: DataSource, team: Team): Promise<GrowthOrderDto[]> {
  return withNames(ds.manager, await ds.getRepository(GrowthOrder).find({ where: { teamId: team.id }, order: { createdAt: 'DESC' }, take: 200 }));
}

export async function orderDetail(ds: DataSource, team: Team, id: unknown): Promise<GrowthOrderDetail> {
  const o = await findOrder(ds.manager, team, id);
  const [order] = await withNames(ds.manager, [o]);
  const timeline: Array<{ at: Date; by_user: string; kind: string; from_state: string | null; to_state: string | null; note: string }> = await ds.query('SELECT at, by_user, kind, from_state, to_state, note FROM growth_event WHERE order_id = $1 ORDER BY at, id', [o.id]);
  const measurements: Array<{ id: string; uploaded_by: string; uploaded_at: Date; temperature: number; prediction: Record<string, unknown> }> = await ds.query('SELECT id, uploaded_by, uploaded_at, temperature, prediction FROM growth_measurement WHERE order_id = $1 ORDER BY uploaded_at DESC', [o.id]);
  return {
    order: order!, sheet: o.sheet,
    timeline: timeline.map((t) => ({ at: t.at.toISOString(), by: t.by_user, kind: t.kind, fromState: t.from_state, toState: t.to_state, note: t.note })),
    measurements: measurements.map((r) => ({ id: r.id, uploadedBy: r.uploaded_by, uploadedAt: r.uploaded_at.toISOString(), temperature: r.temperature, report: r.prediction })),
  };
}

/** Growers move an order one step forward at a time; closed orders stay closed. */
export async function changeState(ds: DataSource, team: Team, actor: Actor, id: unknown, input: z.output<typeof growthStateChangeSchema>): Promise<void> {
  await ds.transaction(async (m) => {
    const o = await findOrder(m, team, id, true);
    assertOpen(o);
    const from = growerStates.indexOf(o.state as (typeof growerStates)[number]);
    const to = growerStates.indexOf(input.state);
    if (from < 0) throw new HttpError(409, `The order is ${o.state}; it can no longer change.`, [{ field: 'state', message: o.state }], 'Conflict');
    if (to !== from + 1) throw new ValidationError([{ field: 'state', message: `from ${o.state} the next state is ${growerStates[from + 1] ?? 'none (the physicist closes it)'}` }]);
    // A step cannot be undone: the same precondition the client disables its button on.
    const [{ uploads }]: Array<{ uploads: number }> = await m.query('SELECT count(*)::int AS uploads FROM growth_measurement WHERE order_id = $1', [o.id]);
    const blocker = stepBlocker(input.state, { sheetStatus: o.sheetStatus, uploads });
    if (blocker) throw new HttpError(409, `Not ${input.state} yet: ${blocker.message}.`, [blocker], 'Conflict');
    await m.query('UPDATE growth_order SET state = $2, updated_at = now() WHERE id = $1', [o.id, input.state]);
    await event(m, o.id, actor.displayName, 'state', o.state, input.state, input.note);
  });
  await publishEvent(ds, { teamId: team.id, event: 'growth:changed', payload: { orderId: String(id) } });
}

/** The physicist's verdict; the growers are told by a worker once it commits. */
export async function closeOrder(d: GrowthDeps, team: Team, actor: Actor, id: unknown, input: z.output<typeof closeOrderSchema>): Promise<void> {
  const { ds } = d;
  await ds.transaction(async (m) => {
    const o = await findOrder(m, team, id, true);
    assertOpen(o);
    if (input.verdict === 'approved' && o.state !== 'measured') throw new ValidationError([{ field: 'verdict', message: 'approve an order once the grown piece has been measured' }]);
    await m.query('UPDATE growth_order SET state = $2, close_reason = $3, updated_at = now() WHERE id = $1', [o.id, input.verdict, input.reason]);
    await event(m, o.id, actor.displayName, 'closed', o.state, input.verdict, input.reason);
    await enqueueGrowthMail(d.boss, { kind: 'order-closed', orderId: o.id }, m);
  });
  await publishEvent(ds, { teamId: team.id, event: 'growth:changed', payload: { orderId: String(id) } });
}

export async function updateSheetSettings(d: GrowthDeps, team: Team, actor: Actor, id: unknown, input: z.output<typeof sheetSettingsSchema>): Promise<void> {
  await d.ds.transaction(async (m) => {
    const o = await findOrder(m, team, id, true);
    assertOpen(o);
    const next = { zones: input.zones ?? o.zones, lossBudget: input.lossBudget ?? o.lossBudget, measureTemperature: input.measureTemperature ?? o.measureTemperature };
    const recompute = next.lossBudget !== o.lossBudget || next.measureTemperature !== o.measureTemperature;
    await m.query(`UPDATE growth_order SET zones = $2, loss_budget = $3, measure_temperature = $4, sheet_status = CASE WHEN $5 THEN 'computing' ELSE sheet_status END, updated_at = now() WHERE id = $1`,
      [o.id, next.zones, next.lossBudget, next.measureTemperature, recompute]);
    await event(m, o.id, actor.displayName, 'sheet', null, null, `zones ${next.zones}, loss budget ${next.lossBudget}, checks at ${next.measureTemperature} K`);
    if (recompute) await sendSheetJob(d.boss, m, o.id);
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'growth:changed', payload: { orderId: String(id) } });
}

/**
 * The grower's doping scatter: stored, and the yield recomputed by a worker
 * (the zoning and the bands do not depend on it). While the sheet itself is
 * still computing, its job reads the new scatter or queues the yield after.
 */
export async function updateScatter(d: GrowthDeps, team: Team, actor: Actor, id: unknown, input: z.output<typeof yieldSettingsSchema>): Promise<void> {
  await d.ds.transaction(async (m) => {
    const o = await findOrder(m, team, id, true);
    assertOpen(o);
    if (input.dopingScatter === o.dopingScatter) return;
    const ready = o.sheetStatus === 'ready';
    await m.query('UPDATE growth_order SET doping_scatter = $2, sheet_error = CASE WHEN $3 THEN NULL ELSE sheet_error END, sheet_progress = CASE WHEN $3 THEN 0 ELSE sheet_progress END, updated_at = now() WHERE id = $1', [o.id, input.dopingScatter, ready]);
    await event(m, o.id, actor.displayName, 'sheet', null, null, `doping scatter ${input.dopingScatter} decades (1σ) per zone for the yield`);
    if (ready) await sendSheetJob(d.boss, m, o.id, 'yield');
  });
  await publishEvent(d.ds, { teamId: team.id, event: 'growth:changed', payload: { orderId: String(id) } });
}

/** All or nothing: parse, infer, predict, store, then tell the physicist. */
/** `file` is read only once the order is known to be the caller's: another team's order answers 404 first. */
export async function uploadMeasurements(d: GrowthDeps, team: Team, actor: Actor, id: unknown, file: () => Buffer, temperature: number | undefined, hallFactor?: number): Promise<Record<string, unknown>> {
  const o = await findOrder(d.ds.manager, team, id);
  assertOpen(o);
  if (o.sheetStatus !== 'ready' || !o.sheet) throw new HttpError(409, 'The growth sheet is not ready yet.', [{ field: 'sheet', message: o.sheetStatus }], 'Conflict');
  const run = await d.ds.getRepository(Run).findOneByOrFail({ id: o.runId });
  const sheet = o.sheet as unknown as GrowthSheet;
  const t = temperature ?? o.measureTemperature;
  const input: ReportThreadInput = { text: uploadText(file()), caseJson: run.caseJson, sheet, zones: o.zones, temperature: t, hallFactor };
  const parsed = await inApiThread<ReportThreadAnswer>(join(__dirname, 'report-thread.ts'), input, 'file');
  if ('errors' in parsed) throw new ValidationError(parsed.errors.map((e) => ({ field: ['file', e.line ? `line ${e.line}` : '', e.column ?? ''].filter(Boolean).join(':'), message: e.message })));
  const report = { ...parsed.report, uploadWarnings: parsed.warnings };
  await d.ds.transaction(async (m) => {
    // The report took a while: the order may have been closed meanwhile.
    assertOpen(await findOrder(m, team, o.id, true));
    await m.query('INSERT INTO growth_measurement (order_id, uploaded_by, temperature, points, prediction) VALUES ($1, $2, $3, $4, $5)', [o.id, actor.displayName, t, JSON.stringify(parsed.points), JSON.stringify(report)]);
    await event(m, o.id, actor.displayName, 'measured', null, null, `${parsed.points.length} positions uploaded`);
  });
  const flagged = report.verdicts.filter((v) => v.verdict === 'low' || v.verdict === 'high');
  const stray = report.verdicts.filter((v) => v.verdict === 'stray');
  const pointsOutside = report.points.filter((q) => q.readings.some((r) => r.verdict !== 'within')).length;
  const to: Array<{ email: string }> = await d.ds.query(`SELECT DISTINCT email FROM app_user WHERE removed_at IS NULL AND (id = $1 OR id IN (SELECT user_id FROM design_follower WHERE design_id = $2))`, [o.releasedBy, run.designId]);
  if (to.length > 0) {
    await d.mailer.send({
      to: to.map((r) => r.email),
      subject: `Measurements back for batch ${o.batch}: predicted ΔT ${report.asGrown.atDesignCurrent.deltaT.toFixed(1)} K (target ${report.target.deltaT.toFixed(1)} K)`,
      text: [`${actor.displayName} uploaded ${parsed.points.length} measured positions for batch ${o.batch}.`, '',
        `Predicted ΔT of the as-grown leg: ${report.asGrown.atDesignCurrent.deltaT.toFixed(2)} K at the design current, ${report.asGrown.atBestCurrent.deltaT.toFixed(2)} K at its best current (target ${report.target.deltaT.toFixed(2)} K).`,
        ...(report.hall ? [report.hall.note] : []),
        flagged.length ? `Zones out of tolerance: ${flagged.map((v) => `zone ${v.zone + 1} (${v.verdict})`).join(', ')}.` : stray.length ? 'Every measured zone is within tolerance on average, but not every reading is.' : 'Every measured zone is within tolerance.',
        ...(stray.length ? [`Zones with readings outside their band: ${stray.map((v) => `zone ${v.zone + 1} (${v.readingsOutside} of ${v.readings} readings)`).join(', ')}.`] : []),
        `${pointsOutside} of ${report.points.length} measured positions have a reading outside their zone's band.`, '',
        `Open the order: ${d.appOrigin}/growth/${o.id}`, '', 'These are model predictions: confirm with a device measurement before building hardware.'].join('\n'),
    }).catch((err: Error) => console.error(`[api] measurement mail failed: ${err.message}`));
  }
  await publishEvent(d.ds, { teamId: team.id, event: 'growth:changed', payload: { orderId: o.id } });
  return report;
}
