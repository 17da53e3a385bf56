import { parse } from 'csv-parse/sync';
import type { UploadIssue } from '../api/family-upload';
import { readHeader, type Column } from '../families/csv-columns';
import { parseCell } from '../families/parse-number';

/** One measured position along the grown piece, in engine units (mm, V/K, S/m, cm⁻³, K). */
export type MeasuredPoint = { line: number; positionMm: number; seebeck?: number; sigma?: number; perCm3?: number; temperature?: number };

export type MeasurementPreview = { ok: boolean; points: MeasuredPoint[]; columns: Array<{ header: string; quantity: string; unit: string }>; warnings: UploadIssue[]; errors: UploadIssue[] };

type Parsed = { record: string[]; info: { lines: number } };

/**
 * As-grown measurements: position along the piece plus room-temperature
 * Seebeck and/or conductivity (or resistivity), or a carrier concentration
 * from Hall. Headers carry units exactly as for material tables.
 */
export function parseMeasurementsCsv(input: string, lengthMm: number): MeasurementPreview {
  const fail = (errors: UploadIssue[]): MeasurementPreview => ({ ok: false, points: [], columns: [], warnings: [], errors });
  const text = input.replace(/^\uFEFF/, '');
  const first = text.split(/\r?\n/).find((l) => l.trim() !== '' && !l.trim().startsWith('#'));
  if (first === undefined) return fail([{ message: 'the file is empty: expected a header row and one row per measured position' }]);
  const delimiter = first.includes(',') ? ',' : first.includes(';') ? ';' : null;
  if (!delimiter) return fail([{ line: 1, message: 'separate the columns with commas (or semicolons), e.g. position_mm,seebeck_uV_per_K,sigma_S_per_cm' }]);
  let rows: Parsed[];
  try {
    // With `info: true` csv-parse returns { record, info } objects; its typings only describe plain records.
    rows = parse(text, { delimiter, info: true, relax_column_count: true, skip_empty_lines: true, comment: '#', trim: true }) as unknown as Parsed[];
  } catch (err) {
    return fail([{ message: `the file is not valid CSV: ${err instanceof Error ? err.message : String(err)}` }]);
  }
  const [head, ...body] = rows;
  const errors: UploadIssue[] = [];
  const warnings: UploadIssue[] = [];
  const columns: Array<Column & { index: number }> = [];
  head!.record.forEach((h, index) => {
    const v = readHeader(h);
    if (v.kind === 'error') errors.push({ line: 1, column: h, message: v.message });
    else if (v.kind === 'ignored' || v.column.quantity === 'kappa') warnings.push({ line: 1, column: h, message: `column "${h}" is not used for as-grown measurements; it is ignored` });
    else if (columns.some((c) => c.quantity === v.column.quantity)) errors.push({ line: 1, column: h, message: 'a second column for the same quantity' });
    else columns.push({ ...v.column, index });
  });
  const has = (q: string): boolean => columns.some((c) => c.quantity === q);
  if (!has('position')) errors.push({ line: 1, message: 'missing column: position along the piece from its cold end (position_mm)' });
  if (!has('seebeck') && !has('sigma') && !has('resistivity') && !has('perCm3')) errors.push({ line: 1, message: 'missing a measured quantity: seebeck_uV_per_K, sigma_S_per_cm, resistivity_uOhm_m or n_per_cm3' });
  if (errors.length > 0) return { ...fail(errors), warnings };
  if (body.length === 0) return fail([{ message: 'the file has a header but no measurements' }]);
  if (body.length > 2000) return fail([{ message: `${body.length} rows is more than the 2000 measured positions accepted` }]);
  const points: MeasuredPoint[] = [];
  for (const { record, info } of body) {
    const line = info.lines;
    if (record.length !== head!.record.length) { errors.push({ line, message: `has ${record.length} cells where the header has ${head!.record.length}` }); continue; }
    const point: MeasuredPoint = { line, positionMm: NaN };
    let good = true;
    for (const c of columns) {
      const raw = record[c.index] ?? '';
      // A blank measured cell means "not measured here"; the position must always be there.
      if (raw.trim() === '' && c.quantity !== 'position') continue;
      const v = parseCell(raw, delimiter);
      if (!v.ok) { errors.push({ line, column: c.header, message: v.message }); good = false; continue; }
      const value = c.convert(v.value);
      if (c.quantity === 'position') point.positionMm = value;
      else if (c.quantity === 'seebeck') point.seebeck = value;
      else if (c.quantity === 'sigma' || c.quantity === 'resistivity') point.sigma = value;
      else if (c.quantity === 'perCm3') point.perCm3 = value;
      else if (c.quantity === 'temperature') point.temperature = value;
    }
    if (!good) continue;
    if (point.positionMm < 0 || point.positionMm > lengthMm + 1e-9) { errors.push({ line, column: columns.find((c) => c.quantity === 'position')!.header, message: `position ${point.positionMm} mm lies outside the leg (0–${lengthMm} mm)` }); continue; }
    if (point.sigma !== undefined && !(point.sigma > 0)) { errors.push({ line, message: 'conductivity (or resistivity) must be greater than 0' }); continue; }
    if (point.perCm3 !== undefined && !(point.perCm3 >= 1e14 && point.perCm3 <= 1e22)) { errors.push({ line, message: 'carrier concentration must be 1e14–1e22 cm⁻³ (a value in m⁻³ is 10⁶ too large)' }); continue; }
    if (point.seebeck !== undefined && Math.abs(point.seebeck) < 1e-6) warnings.push({ line, message: 'Seebeck below 1 µV/K: was it written in V/K under a µV/K header?' });
    if (point.seebeck === undefined && point.sigma === undefined && point.perCm3 === undefined) { errors.push({ line, message: 'no measured value on this row' }); continue; }
    points.push(point);
  }
  return { ok: errors.length === 0 && points.length > 0, points, columns: columns.map((c) => ({ header: c.header, quantity: c.quantity, unit: c.unit })), warnings, errors };
}
