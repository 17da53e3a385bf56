/**
 * The one way Frostgrade writes CSV (RFC 4180, LF line ends). Exports carry
 * text people typed (family names and sources, module names, growth
 * batches), and a spreadsheet that opens the file runs a cell starting with
 * `=`, `+`, `-` or `@` as a formula ("CSV injection", OWASP). So a cell's
 * type decides how it is written: a number is written as a number (`-1.5e-6`
 * stays a number), text is quoted when it holds a comma, quote, CR or LF,
 * and text that a spreadsheet would read as a formula gets a leading
 * apostrophe, which spreadsheets take as "this is text" and hide.
 */

/** A number (a numeric cell; non-finite or absent is an empty cell) or text. */
export type CsvCell = number | string | null | undefined;

/**
 * First characters a spreadsheet treats as the start of a formula (OWASP's
 * list, plus their full-width forms, which some spreadsheets fold to ASCII),
 * also after leading blanks, which some spreadsheets trim before deciding.
 */
const formulaStart = /^[\t\r]|^[ \t\r\n]*[=+\-@＝＋－＠]/;

const needsQuotes = /[",\r\n]/;

/** Text as a spreadsheet may not execute it: a formula-like start gets `'` in front. */
export function neutralise(text: string): string {
  return formulaStart.test(text) ? `'${text}` : text;
}

function quoted(text: string): string {
  return needsQuotes.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One cell: numbers as they are, text neutralised and quoted as needed. */
export function csvCell(cell: CsvCell): string {
  if (typeof cell === 'number') return Number.isFinite(cell) ? String(cell) : '';
  if (cell === null || cell === undefined) return '';
  return quoted(neutralise(cell));
}

export function csvRow(cells: readonly CsvCell[]): string {
  return cells.map(csvCell).join(',');
}

/** What an exporter may put in a comment's first cell: written by us, never a user's text. */
const plainLead = /^[^",\r\n]*$/;

/**
 * A comment line above the header: `# lead,cell,cell…`. Readers that skip
 * lines starting with `#` (our own upload parsers, most CSV libraries) skip
 * it whole; a spreadsheet shows it as a row whose first cell starts with `#`
 * and whose other cells are ordinary text cells, neutralised and quoted. A
 * comment is one line: line breaks in its cells become spaces, so no text
 * can start a row of its own. `lead` is the exporter's own words.
 */
export function csvComment(lead: string, ...cells: CsvCell[]): string {
  if (!plainLead.test(lead)) throw new Error(`a CSV comment's lead must not hold a quote, comma or line break: ${JSON.stringify(lead)}`);
  const oneLine = cells.map((c) => (typeof c === 'string' ? c.replace(/\r\n|[\r\n]/g, ' ') : c));
  return [`# ${lead}`, ...oneLine.map(csvCell)].join(',');
}

/** Comment lines, the header, the rows; LF after every line. */
export function csvDocument(d: { comments?: readonly string[]; header: readonly string[]; rows: readonly (readonly CsvCell[])[] }): string {
  return [...(d.comments ?? []), csvRow(d.header), ...d.rows.map(csvRow)].map((line) => `${line}\n`).join('');
}
