import { parse } from 'csv-parse/sync';
import type { UploadIssue, UploadPreview, UploadRow } from '../api/family-upload';
import { CaseError } from '../engine/case-error';
import { tableRowSchema } from '../engine/case-schema';
import { familyFromMaterial } from '../engine/check-case';
import { breach, tableBreach, type TableLimitBreach } from '../engine/table-limits';
import { readHeader, type Column, type Quantity } from './csv-columns';
import { parseCell } from './parse-number';
import { gridCoverage } from './table-coverage';
import { magnitudeWarnings } from './magnitude-warnings';

/**
 * A file over one of the size caps (tableLimits): refused as a whole before
 * anything proportional to its grid is built. Not a preview error, because
 * nothing below the cap was checked.
 */
export class TableLimitError extends Error {
  constructor(readonly breach: TableLimitBreach) {
    super(`the file has ${breach.message}`);
    this.name = 'TableLimitError';
  }
}

/** Problems listed per kind; a broken 20,000-row file would otherwise answer with megabytes of the same complaint. */
export const issuesListed = 100;

function listed(issues: UploadIssue[], kind: string): UploadIssue[] {
  if (issues.length <= issuesListed) return issues;
  return [...issues.slice(0, issuesListed), { message: `${issues.length - issuesListed} more ${kind} not listed; fix the ones above and upload the file again` }];
}

/** Non-blank, non-comment lines after the header: the rows csv-parse would return, counted before it runs. */
function dataLineCount(text: string): number {
  let count = 0;
  for (let start = 0; start < text.length; ) {
    const nl = text.indexOf('\n', start);
    const end = nl < 0 ? text.length : nl;
    const line = text.slice(start, end).trim();
    if (line !== '' && !line.startsWith('#')) count += 1;
    start = end + 1;
  }
  return Math.max(0, count - 1);
}

type Parsed = { record: string[]; info: { lines: number } };

function emptyPreview(errors: UploadIssue[], warnings: UploadIssue[] = []): UploadPreview {
  return {
    ok: false, rowCount: 0, columns: [], rows: [], carrier: null,
    coverage: { dopings: [], temperatures: [], measured: 0, holes: 0, firstHoles: [], present: [] },
    warnings: listed(warnings, 'warnings'), errors: listed(errors, 'errors'),
  };
}

/** Comma or semicolon; anything else is named so the user knows what to change. */
function detectDelimiter(headerLine: string): { delimiter: string } | { error: string } {
  const count = (c: string): number => headerLine.split(c).length - 1;
  if (count(',') > 0 && count(',') >= count(';')) return { delimiter: ',' };
  if (count(';') > 0) return { delimiter: ';' };
  if (count('\t') > 0) return { error: 'columns are separated by tabs; separate them with commas (or semicolons)' };
  if (count('|') > 0) return { error: 'columns are separated by "|"; separate them with commas (or semicolons)' };
  return { error: 'the header has a single column; expected comma-separated columns such as n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K' };
}

type TableQuantity = Exclude<Quantity, 'position'>;
type TableColumn = Column & { quantity: TableQuantity; index: number };

function readColumns(header: string[]): { columns: TableColumn[]; errors: UploadIssue[]; warnings: UploadIssue[] } {
  const columns: TableColumn[] = [];
  const errors: UploadIssue[] = [];
  const warnings: UploadIssue[] = [];
  header.forEach((h, index) => {
    const v = readHeader(h);
    if (v.kind === 'error') errors.push({ line: 1, column: h, message: v.message });
    else if (v.kind === 'ignored' || v.column.quantity === 'position') warnings.push({ line: 1, column: h, message: `column "${h}" is not a quantity a material table holds; it is ignored` });
    else if (columns.some((c) => c.quantity === v.column.quantity)) errors.push({ line: 1, column: h, message: `a second column for the same quantity as "${columns.find((c) => c.quantity === v.column.quantity)!.header}"` });
    else columns.push({ ...v.column, quantity: v.column.quantity, index });
  });
  const has = (q: TableQuantity): boolean => columns.some((c) => c.quantity === q);
  const need: Array<[boolean, string]> = [
    [has('perCm3'), 'carrier concentration (e.g. n_per_cm3)'],
    [has('temperature'), 'temperature (e.g. temperature_K)'],
    [has('seebeck'), 'Seebeck coefficient (e.g. seebeck_uV_per_K)'],
    [has('sigma') || has('resistivity'), 'electrical conductivity or resistivity (e.g. sigma_S_per_cm or resistivity_uOhm_m)'],
    [has('kappa'), 'thermal conductivity (e.g. kappa_W_per_m_K)'],
  ];
  for (const [ok, what] of need) if (!ok) errors.push({ line: 1, message: `missing column: ${what}` });
  if (has('sigma') && has('resistivity')) errors.push({ line: 1, message: 'give either conductivity or resistivity, not both' });
  return { columns, errors, warnings };
}

/**
 * Reads a measured family from CSV text into engine units, with every
 * problem located by line and column. Nothing here saves: `ok` says whether
 * the table may be saved as it is.
 */
export function parseTableCsv(input: string): UploadPreview {
  const text = input.replace(/^\uFEFF/, '');
  const tooMany = breach('rows', dataLineCount(text));
  if (tooMany) throw new TableLimitError(tooMany);
  const firstLine = text.split(/\r?\n/).find((l) => l.trim() !== '' && !l.trim().startsWith('#'));
  if (firstLine === undefined) return emptyPreview([{ message: 'the file is empty: expected a header row and one row per measured point' }]);
  const d = detectDelimiter(firstLine);
  if ('error' in d) return emptyPreview([{ line: 1, message: d.error }]);
  let records: Parsed[];
  try {
    // With `info: true` csv-parse returns { record, info } objects; its typings only describe plain records.
    records = parse(text, { delimiter: d.delimiter, info: true, relax_column_count: true, skip_empty_lines: true, comment: '#', trim: true }) as unknown as Parsed[];
  } catch (err) {
    return emptyPreview([{ message: `the file is not valid CSV: ${err instanceof Error ? err.message : String(err)}` }]);
  }
  const [head, ...body] = records;
  const { columns, errors, warnings } = readColumns(head!.record);
  if (errors.length > 0) return emptyPreview(errors, warnings);
  if (body.length === 0) return { ...emptyPreview([{ message: 'the file has a header but no data rows' }], warnings), columns: columns.map(strip) };

  const rows: UploadRow[] = [];
  for (const { record, info } of body) {
    const line = info.lines;
    if (record.length !== head!.record.length) {
      errors.push({ line, message: `has ${record.length} cells where the header has ${head!.record.length}` });
      continue;
    }
    const row = readRow(record, line, columns, d.delimiter, errors);
    if (row) rows.push(row);
  }
  const over = tableBreach(rows);
  if (over) throw new TableLimitError(over);
  warnings.push(...magnitudeWarnings(body.map((b) => ({ line: b.info.lines, record: b.record })), columns));
  const grid = gridCoverage(rows);
  errors.push(...grid.errors);
  warnings.push(...grid.warnings);
  const carrier = rows.length > 0 ? (rows[0]!.seebeck < 0 ? 'n' : 'p') : null;
  if (errors.length === 0) checkWithEngine(rows, errors);
  return { ok: errors.length === 0, rowCount: body.length, columns: columns.map(strip), rows, carrier, coverage: grid.coverage, warnings: listed(warnings, 'warnings'), errors: listed(errors, 'errors') };
}

function strip(c: TableColumn): { header: string; quantity: TableQuantity; unit: string; toEngine: string } {
  return { header: c.header, quantity: c.quantity, unit: c.unit, toEngine: c.toEngine };
}

const engineField: Record<TableQuantity, keyof Omit<UploadRow, 'line'>> = {
  perCm3: 'perCm3', temperature: 'temperature', seebeck: 'seebeck', sigma: 'sigma', resistivity: 'sigma', kappa: 'kappa',
};

function readRow(record: string[], line: number, columns: TableColumn[], delimiter: string, errors: UploadIssue[]): UploadRow | null {
  const row: UploadRow = { line, perCm3: 0, temperature: 0, seebeck: 0, sigma: 0, kappa: 0 };
  let good = true;
  for (const c of columns) {
    const v = parseCell(record[c.index] ?? '', delimiter);
    if (!v.ok) {
      errors.push({ line, column: c.header, message: v.message });
      good = false;
      continue;
    }
    if (c.quantity === 'resistivity' && v.value <= 0) {
      errors.push({ line, column: c.header, message: `resistivity ${v.value} must be greater than 0` });
      good = false;
      continue;
    }
    row[engineField[c.quantity]] = c.convert(v.value);
  }
  if (!good) return null;
  // The engine's own limits, reported against the column the user wrote.
  const checked = tableRowSchema.safeParse({ perCm3: row.perCm3, temperature: row.temperature, seebeck: row.seebeck, sigma: row.sigma, kappa: row.kappa });
  if (!checked.success) {
    for (const issue of checked.error.issues) {
      const q = String(issue.path[0]);
      const col = columns.find((c) => engineField[c.quantity] === q);
      errors.push({ line, column: col?.header, message: `${issue.message} (after converting from ${col?.unit ?? 'the file'})` });
    }
    return null;
  }
  return row;
}

/** Whatever else the engine refuses (mixed Seebeck signs, …) is reported, never saved. */
function checkWithEngine(rows: UploadRow[], errors: UploadIssue[]): void {
  try {
    familyFromMaterial({ kind: 'table', rows: rows.map(({ line: _line, ...r }) => r) });
  } catch (err) {
    if (!(err instanceof CaseError)) throw err;
    const m = /rows\[(\d+)\]/.exec(err.field);
    const line = m ? rows[Number(m[1])]?.line : undefined;
    errors.push({ ...(line ? { line } : {}), message: err.message });
  }
}
