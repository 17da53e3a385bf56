import { join } from 'node:path';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import type { GrowthSheet } from '../shared/growth/growth-sheet';
import { publishEvent } from '../server/db/events';
import { queues } from '../server/queue/queues';
import { runInThread } from '../server/threads/run-in-thread';
import type { SheetThreadInput } from './sheet-thread';

/** Zones tried on every sheet; a grower rarely makes more. */
const MAX_ZONES = 12;
/** Progress is written at most this often (each write is an UPDATE and a NOTIFY). */
const PROGRESS_EVERY_MS = 1000;

/** A sheet job computes the whole sheet; a yield job only the yields of the stored sheet at the order's scatter. */
export type SheetJobData = { orderId: string; kind?: 'sheet' | 'yield' };

type Row = {
  id: string; team_id: string; loss_budget: number; measure_temperature: number; doping_scatter: number; sheet_status: string; sheet: GrowthSheet | null;
  case_json: unknown; result: { doping: { x: number[]; perCm3: number[] }; objective: { value: number }; deltaT: number }; design_snapshot: { lengthMm: number; minZoneMm?: number };
};

const changed = async (ds: DataSource, o: Row): Promise<void> => {
  await publishEvent(ds, { teamId: o.team_id, event: 'growth:changed', payload: { orderId: o.id } });
  await publishEvent(ds, { teamId: o.team_id, room: `growth:${o.id}`, event: 'growth:changed', payload: { orderId: o.id } });
};

/**
 * Writes how far the thread has got, at most once a second, and tells the
 * order's watchers. `settled` is awaited before the job's last write, so no
 * late progress lands on a finished order.
 */
function progressWriter(ds: DataSource, o: Row): { write: (fraction: number) => void; settled: () => Promise<void> } {
  let last = 0;
  let pending: Promise<void> = Promise.resolve();
  const write = (fraction: number): void => {
    const now = Date.now();
    if (now - last < PROGRESS_EVERY_MS) return;
    last = now;
    pending = pending
      .then(() => ds.query('UPDATE growth_order SET sheet_progress = $2 WHERE id = $1', [o.id, fraction]))
      .then(() => changed(ds, o))
      .catch((err: Error) => console.error(`[worker] sheet progress of ${o.id}: ${err.message}`));
  };
  return { write, settled: () => pending };
}

/** The order's yield job, queued when the sheet was computed at a scatter that has since changed. */
export const sendYieldJob = (boss: PgBoss, orderId: string) => boss.send(queues.growthSheet, { orderId, kind: 'yield' } satisfies SheetJobData);

/**
 * Computes a growth order's sheet, or (kind 'yield') only its yields. A
 * sheet is written only if the order's budget and check temperature are
 * still those it was computed for (a newer job handles a newer choice); a
 * yield only onto the same ready sheet at the same scatter. A sheet computed
 * at a scatter changed meanwhile queues a yield job for the new one.
 */
export async function sheetJob(ds: DataSource, boss: PgBoss, data: SheetJobData): Promise<string> {
  const [o]: Row[] = await ds.query(
    `SELECT o.id, o.team_id, o.loss_budget, o.measure_temperature, o.doping_scatter, o.sheet_status, o.sheet, r.case_json, r.result, r.design_snapshot
     FROM growth_order o JOIN run r ON r.id = o.run_id WHERE o.id = $1`, [data.orderId]);
  if (!o) return 'order no longer exists';
  const t0 = Date.now();
  const yieldOnly = data.kind === 'yield';
  // A yield job waits for no sheet: the sheet job in flight computes the yield itself, at the scatter it reads.
  if (yieldOnly && (o.sheet_status !== 'ready' || !o.sheet)) return 'no ready sheet; the sheet job computes the yield';
  if (yieldOnly && o.sheet!.dopingScatter === o.doping_scatter) return 'yield already at this scatter';
  const input: SheetThreadInput = yieldOnly
    ? { kind: 'yield', caseJson: o.case_json, sheet: o.sheet!, dopingScatter: o.doping_scatter }
    : {
      kind: 'sheet', caseJson: o.case_json, continuous: { ...o.result.doping, value: o.result.objective.value, deltaT: o.result.deltaT },
      options: { lengthMm: Number(o.design_snapshot.lengthMm), minZoneMm: Number(o.design_snapshot.minZoneMm ?? 0), maxZones: MAX_ZONES, lossBudget: o.loss_budget, measureTemperature: o.measure_temperature, dopingScatter: o.doping_scatter },
    };
  await ds.query('UPDATE growth_order SET sheet_progress = 0 WHERE id = $1', [o.id]);
  const progress = progressWriter(ds, o);
  const out = await runInThread<GrowthSheet>(join(__dirname, 'sheet-thread.ts'), input, { onProgress: progress.write }).then(
    (sheet) => ({ ok: true as const, sheet }),
    (err: Error) => ({ ok: false as const, message: err.message }),
  );
  await progress.settled();
  let written = 0;
  if (yieldOnly) {
    [, written] = out.ok
      ? await ds.query(`UPDATE growth_order SET sheet = $2, sheet_error = NULL, sheet_progress = NULL, updated_at = now() WHERE id = $1 AND sheet_status = 'ready' AND loss_budget = $3 AND measure_temperature = $4 AND doping_scatter = $5`,
        [o.id, JSON.stringify(out.sheet), o.loss_budget, o.measure_temperature, o.doping_scatter])
      : await ds.query(`UPDATE growth_order SET sheet_error = $2, sheet_progress = NULL, updated_at = now() WHERE id = $1`, [o.id, `the yield could not be computed: ${out.message}`]);
  } else {
    [, written] = out.ok
      ? await ds.query(`UPDATE growth_order SET sheet = $2, sheet_status = 'ready', sheet_error = NULL, sheet_progress = NULL, updated_at = now() WHERE id = $1 AND loss_budget = $3 AND measure_temperature = $4`, [o.id, JSON.stringify(out.sheet), o.loss_budget, o.measure_temperature])
      : await ds.query(`UPDATE growth_order SET sheet_status = 'failed', sheet_error = $2, sheet_progress = NULL, updated_at = now() WHERE id = $1`, [o.id, `the zoning could not be computed: ${out.message}`]);
    const [now]: Array<{ doping_scatter: number }> = await ds.query('SELECT doping_scatter FROM growth_order WHERE id = $1', [o.id]);
    if (out.ok && written && now && now.doping_scatter !== o.doping_scatter) await sendYieldJob(boss, o.id);
  }
  // Superseded: a newer job owns the order now and writes its own progress.
  if (!written) await ds.query('UPDATE growth_order SET sheet_progress = NULL WHERE id = $1', [o.id]);
  await changed(ds, o);
  const what = yieldOnly ? 'yield' : 'sheet';
  return out.ok ? `${what} ${written ? 'ready' : 'superseded'} in ${((Date.now() - t0) / 1000).toFixed(1)} s` : `${what} failed: ${out.message}`;
}
