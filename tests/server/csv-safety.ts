import { parse } from 'csv-parse/sync';

/** Text people may type as a name, source or batch, each aimed at a spreadsheet or a naive CSV writer. */
export const hostileTexts = ['x,=1+1,@SUM(1)', '"quoted"', 'line one\nline two', "+cmd|' /C calc'!A0", '-2+3', '@import'];

/** How a comment line carries a user's text: on one line (line breaks become spaces). */
export const oneLine = (text: string): string => text.replace(/\r\n|[\r\n]/g, ' ');

const formulaFirst = /^[=+\-@\t\r]/;
const numeric = /^-?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

export type ReadCsv = { comments: string[][]; header: string[]; rows: string[][] };

/**
 * Reads an export back with csv-parse and checks what a spreadsheet would
 * do with it: every physical line is one record (no text started a row of
 * its own), comments come first and start with `#`, every data cell is a
 * number (or one of `words`), and no cell that is not a number starts like
 * a formula.
 */
export function readSafeCsv(text: string, words: readonly string[] = []): ReadCsv {
  const records = parse(text, { relax_column_count: true }) as string[][];
  expect(text.endsWith('\n')).toBe(true);
  expect(text.slice(0, -1).split('\n')).toHaveLength(records.length);
  const headerAt = records.findIndex((r) => !r[0]!.startsWith('#'));
  const comments = records.slice(0, headerAt);
  const header = records[headerAt]!;
  const rows = records.slice(headerAt + 1);
  for (const c of comments) expect(c[0]).toMatch(/^# /);
  for (const r of rows) {
    expect(r).toHaveLength(header.length);
    for (const cell of r) expect(cell === '' || numeric.test(cell) || words.includes(cell) ? 'number' : `not a number: ${cell}`).toBe('number');
  }
  for (const cell of records.flat()) if (!numeric.test(cell)) expect(cell).not.toMatch(formulaFirst);
  return { comments, header, rows };
}

/** A record holds `text` as a cell: exactly, or behind the apostrophe that keeps a spreadsheet from running it when it starts like a formula. */
export function expectCellOf(cells: string[], text: string): void {
  expect(cells).toContain(formulaFirst.test(text) ? `'${text}` : text);
}
