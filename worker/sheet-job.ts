import { join } from 'node:path';
import type { DataSource } from 'typeorm';
import type { GrowthSheet } from '../shared/growth/growth-sheet';
import { publishEvent } from '../server/db/events';
import { runInThread } from '../server/threads/run-in-thread';
import type { SheetThreadInput } from './sheet-thread';

/** Zones tried on every sheet; a grower rarely makes more. */
const MAX_ZONES = 12;

type Row = { id: string; team_id: string; loss_budget: number; measure_temperature: number; case_json: unknown; result: { doping: { x: number[]; perCm3: number[] }; objective: { value: number }; deltaT: number }; design_snapshot: { lengthMm: number; minZoneMm?: number } };

/**
 * Computes a growth order's sheet. It is written only if the order's budget
 * and check temperature are still those it was computed for (a newer job
 * handles a newer choice).
 */
export async function sheetJob(ds: DataSource, orderId: string): Promise<string> {
  const [o]: Row[] = await ds.query(
    `SELECT o.id, o.team_id, o.loss_budget, o.measure_temperature, r.case_json, r.result, r.design_snapshot
     FROM growth_order o JOIN run r ON r.id = o.run_id WHERE o.id = $1`, [orderId]);
  if (!o) return 'order no longer exists';
  const options = { lengthMm: Number(o.design_snapshot.lengthMm), minZoneMm: Number(o.design_snapshot.minZoneMm ?? 0), maxZones: MAX_ZONES, lossBudget: o.loss_budget, measureTemperature: o.measure_temperature };
  const continuous = { ...o.result.doping, value: o.result.objective.value, deltaT: o.result.deltaT };
  const t0 = Date.now();
  const input: SheetThreadInput = { caseJson: o.case_json, continuous, options };
  const out = await runInThread<GrowthSheet>(join(__dirname, 'sheet-thread.ts'), input).then(
    (sheet) => ({ ok: true as const, sheet }),
    (err: Error) => ({ ok: false as const, message: err.message }),
  );
  const [, written]: [unknown, number] = out.ok
    ? await ds.query(`UPDATE growth_order SET sheet = $2, sheet_status = 'ready', sheet_error = NULL, updated_at = now() WHERE id = $1 AND loss_budget = $3 AND measure_temperature = $4`, [o.id, JSON.stringify(out.sheet), o.loss_budget, o.measure_temperature])
    : await ds.query(`UPDATE growth_order SET sheet_status = 'failed', sheet_error = $2, updated_at = now() WHERE id = $1`, [o.id, `the zoning could not be computed: ${out.message}`]);
  await publishEvent(ds, { teamId: o.team_id, event: 'growth:changed', payload: { orderId: o.id } });
  await publishEvent(ds, { teamId: o.team_id, room: `growth:${o.id}`, event: 'growth:changed', payload: { orderId: o.id } });
  return out.ok ? `sheet ${written ? 'ready' : 'superseded'} in ${((Date.now() - t0) / 1000).toFixed(1)} s` : `failed: ${out.message}`;
}
