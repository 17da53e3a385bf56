import type { DataSource } from 'typeorm';
import { jointBandNote, readReport, yieldNote, type InferredPointView, type ReadingView } from '../../shared/api/growth-documents';
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import { Team } from '../db/entities';
import { HttpError, NotFoundError } from '../http/errors';
import { isUuid } from '../http/validate';
import { csvComment, csvDocument } from './csv-writer';
import { findOrder } from './growth-service';

const g = (v: number, digits = 4): number => Number(v.toPrecision(digits));

/** What the sheet was computed with: contacts per junction (µΩ·cm²) and parasitic heat per leg. */
function endsComment(sheet: GrowthSheet): [string, ...string[]] {
  const e = sheet.ends;
  const contacts = e?.contacts ? `computed with contacts ${g(e.contacts.cold / 1e-10)} µΩ·cm² (cold) and ${g(e.contacts.hot / 1e-10)} µΩ·cm² (hot)` : 'computed with ideal contacts';
  const load = e?.parasitic?.heatLoad ? [`parasitic load ${g(e.parasitic.heatLoad)} W per leg`] : [];
  const rad = e?.parasitic?.radiation ? [`radiation onto the sides, emissivity ${e.parasitic.radiation.emissivity}, surroundings ${e.parasitic.radiation.surroundings} K`] : [];
  return [contacts, ...(load.length || rad.length ? [...load, ...rad] : ['no parasitic heat'])];
}

/** The chosen K of the sheet, one row per zone, units in every header; JSON carries the whole sheet. */
export async function exportSheet(ds: DataSource, team: Team, id: unknown, format: 'csv' | 'json'): Promise<{ filename: string; body: string }> {
  const o = await findOrder(ds.manager, team, id);
  if (o.sheetStatus !== 'ready' || !o.sheet) throw new HttpError(409, 'The growth sheet is not ready yet.', [{ field: 'sheet', message: o.sheetStatus }], 'Conflict');
  const sheet = o.sheet as unknown as GrowthSheet;
  const stem = `growth-${o.batch.replace(/[^A-Za-z0-9._-]+/g, '-')}-${o.zones}-zones`;
  if (format === 'json') return { filename: `${stem}.json`, body: `${JSON.stringify({ batch: o.batch, dueDate: o.dueDate, zones: o.zones, sheet }, null, 2)}\n` };
  const step = sheet.steps.find((s) => s.zones === o.zones) ?? sheet.steps[sheet.steps.length - 1]!;
  const t = sheet.measureTemperature;
  const header = ['zone', 'start_mm', 'end_mm', 'n_target_per_cm3', 'n_low_per_cm3', 'n_high_per_cm3', `seebeck_${t}K_uV_per_K`, 'seebeck_low_uV_per_K', 'seebeck_high_uV_per_K', `sigma_${t}K_S_per_cm`, 'sigma_low_S_per_cm', 'sigma_high_S_per_cm'];
  const rows = step.rows.map((r) => [r.index + 1, g(r.startMm), g(r.endMm), g(r.perCm3), g(r.lowPerCm3), g(r.highPerCm3), g(r.seebeckUvK), g(r.seebeckBandUvK[0]), g(r.seebeckBandUvK[1]), g(r.sigmaSCm), g(r.sigmaBandSCm[0]), g(r.sigmaBandSCm[1])]);
  const comments = [
    csvComment('Frostgrade growth sheet for batch', o.batch, `${step.zones} zones from the cold end`),
    // The notes hold commas, which a comment's lead may not: they go in cells of their own.
    csvComment('tolerance bands', jointBandNote(step.joint, sheet.lossBudget, sheet.unit)),
    csvComment(`predicted ΔT ${g(step.deltaT)} K at ${g(step.current)} A (continuous profile ${g(sheet.continuous.deltaT)} K)`),
    csvComment(...endsComment(sheet)),
    ...(step.yield ? [csvComment('yield', yieldNote(step.yield, sheet.unit), `simulated ΔT 5 % / 50 % / 95 %: ${g(step.yield.p05)} / ${g(step.yield.p50)} / ${g(step.yield.p95)} K`)] : []),
    csvComment('Model predictions: verify the grown piece by measurement before building hardware; follow lab safety rules and local codes.'),
  ];
  return { filename: `${stem}.csv`, body: csvDocument({ comments, header, rows }) };
}

const readingWords: Record<ReadingView['verdict'], string> = { within: 'within band', low: 'below band', high: 'above band' };

/** A reading's four cells: value, band low and high, verdict in words; empty when it was not measured. */
function readingCells(p: InferredPointView, kind: ReadingView['kind']): Array<number | string | null> {
  const r = p.readings?.find((x) => x.kind === kind);
  if (!r) return [null, null, null, ''];
  const [low, high] = [r.low, r.high].sort((a, b) => a - b);
  return [g(r.value, 6), g(low!), g(high!), readingWords[r.verdict]];
}

/**
 * One upload's report (the newest, or `uploadId`): one row per measured
 * position with each reading, the band it was judged against and the
 * verdict in words, then the position's verdict; the zone verdicts and the
 * predicted ΔT go in the comments.
 */
export async function exportReport(ds: DataSource, team: Team, id: unknown, uploadId?: unknown): Promise<{ filename: string; body: string }> {
  const o = await findOrder(ds.manager, team, id);
  if (uploadId !== undefined && !isUuid(uploadId)) throw new NotFoundError('measurement upload');
  const rows: Array<{ id: string; uploaded_by: string; uploaded_at: Date; temperature: number; prediction: unknown }> = await ds.query(
    `SELECT id, uploaded_by, uploaded_at, temperature, prediction FROM growth_measurement WHERE order_id = $1 AND ($2::uuid IS NULL OR id = $2::uuid) ORDER BY uploaded_at DESC LIMIT 1`,
    [o.id, uploadId ?? null]);
  const upload = rows[0];
  if (!upload) {
    if (uploadId !== undefined) throw new NotFoundError('measurement upload');
    throw new HttpError(409, 'No measurements have been uploaded for this order yet.', [{ field: 'measurements', message: 'no upload yet' }], 'Conflict');
  }
  const report = readReport(upload.prediction);
  if (!report) throw new HttpError(409, 'This upload\'s report is not in a shape this version of Frostgrade understands.', [{ field: 'report', message: 'unreadable' }], 'Conflict');
  const judged = report.points.some((p) => p.readings !== undefined);
  const header = ['line', 'position_mm', 'zone', 'n_inferred_per_cm3',
    'seebeck_uV_per_K', 'seebeck_band_low_uV_per_K', 'seebeck_band_high_uV_per_K', 'seebeck_verdict',
    'sigma_S_per_cm', 'sigma_band_low_S_per_cm', 'sigma_band_high_S_per_cm', 'sigma_verdict',
    'hall_carriers_per_cm3', 'hall_band_low_per_cm3', 'hall_band_high_per_cm3', 'hall_verdict', 'verdict'];
  const body = [...report.points].sort((a, b) => a.positionMm - b.positionMm).map((p) => {
    const outside = (p.readings ?? []).filter((r) => r.verdict !== 'within').length;
    const verdict = p.readings === undefined ? 'not judged (uploaded before readings were checked)' : outside > 0 ? `outside band (${outside} of ${p.readings.length} readings)` : 'within band';
    return [p.line, g(p.positionMm, 6), p.zone === undefined ? null : p.zone + 1, g(p.perCm3), ...readingCells(p, 'seebeck'), ...readingCells(p, 'sigma'), ...readingCells(p, 'hall'), verdict];
  });
  const zoneWords: Record<string, string> = { within: 'within band', low: 'below band', high: 'above band', stray: 'readings outside band', unmeasured: 'not measured' };
  const zones = report.verdicts.map((v) => `zone ${v.zone + 1} ${zoneWords[v.verdict]}${v.readings ? ` (${v.readingsOutside ?? 0} of ${v.readings} readings outside)` : ''}`);
  const comments = [
    csvComment('Frostgrade as-grown measurement report for batch', o.batch, `${report.zones} zones from the cold end`),
    csvComment('uploaded by', upload.uploaded_by, `${upload.uploaded_at.toISOString()}; measured at ${g(upload.temperature)} K`),
    csvComment('zone verdicts', zones.join('; ')),
    csvComment(`predicted ΔT ${g(report.asGrown.atDesignCurrent.deltaT)} K at the design current ${g(report.target.current)} A (target ${g(report.target.deltaT)} K)`),
    ...(judged ? [] : [csvComment('readings not judged: this upload predates the check of each reading; upload it again to check every measurement')]),
    csvComment('Model predictions: verify the grown piece by measurement before building hardware; follow lab safety rules and local codes.'),
  ];
  const stem = `measurements-${o.batch.replace(/[^A-Za-z0-9._-]+/g, '-')}-${upload.uploaded_at.toISOString().slice(0, 10)}`;
  return { filename: `${stem}.csv`, body: csvDocument({ comments, header, rows: body }) };
}
