import type { DataSource } from 'typeorm';
import { jointBandNote, yieldNote } from '../../shared/api/growth-documents';
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import { Team } from '../db/entities';
import { HttpError } from '../http/errors';
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
