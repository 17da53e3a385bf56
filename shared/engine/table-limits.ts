import { gridLines, sameDoping, sameTemperature } from './grid-lines';

/**
 * How large a measured table may be, checked before anything proportional to
 * dopings × temperatures is built.
 *
 * A measurement campaign is tens of samples (each doping is a grown and
 * measured piece) × tens of temperatures (instruments step 5–25 K): 30 × 40 is
 * 1,200 points. The caps sit an order of magnitude above any campaign, yet keep
 * the grid the checks and the spline build (dopings × temperatures cells) under
 * 60,000 cells. Without them a file of 2,000 rows with all dopings and
 * temperatures distinct asked for a 4-million-cell grid.
 */
export const tableLimits = {
  /** Data rows of one table (20,000 = a full 100 × 200 grid). */
  rows: 20_000,
  /** Different carrier concentrations: 200 grown samples is far beyond any campaign. */
  dopings: 200,
  /** Different temperatures: 2 K steps from 100 K to 700 K are 300. */
  temperatures: 300,
} as const;

export type TableLimitBreach = { limit: keyof typeof tableLimits; found: number; max: number; message: string };

const describe = {
  rows: (found: number) => `${found} rows; a table holds at most ${tableLimits.rows} (a full measurement campaign is a few thousand points)`,
  dopings: (found: number) => `${found} different carrier concentrations; a table holds at most ${tableLimits.dopings} (a measurement campaign has tens)`,
  temperatures: (found: number) => `${found} different temperatures; a table holds at most ${tableLimits.temperatures} (a measurement campaign has tens)`,
};

export function breach(limit: keyof typeof tableLimits, found: number): TableLimitBreach | null {
  return found > tableLimits[limit] ? { limit, found, max: tableLimits[limit], message: describe[limit](found) } : null;
}

/** The first cap a table's rows break (row count, then distinct dopings and temperatures), or null. */
export function tableBreach(rows: ReadonlyArray<{ perCm3: number; temperature: number }>): TableLimitBreach | null {
  return (
    breach('rows', rows.length) ??
    breach('dopings', gridLines(rows.map((r) => r.perCm3), sameDoping).length) ??
    breach('temperatures', gridLines(rows.map((r) => r.temperature), sameTemperature).length)
  );
}
