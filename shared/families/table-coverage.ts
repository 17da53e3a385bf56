import type { UploadIssue } from '../api/family-upload';

/** Grid lines closer than this (relative) are the same doping; temperatures within 1e-6 K are the same. */
const SAME_DOPING = 1e-9;
const SAME_TEMPERATURE = 1e-6;

export type GridRow = { line: number; perCm3: number; temperature: number };
export type Coverage = { dopings: number[]; temperatures: number[]; present: boolean[][] };

function lines(values: number[], same: (a: number, b: number) => boolean): number[] {
  const out: number[] = [];
  for (const v of [...values].sort((a, b) => a - b)) if (out.length === 0 || !same(out[out.length - 1]!, v)) out.push(v);
  return out;
}

const sameDoping = (a: number, b: number): boolean => Math.abs(a - b) <= SAME_DOPING * Math.max(a, b);
const sameTemperature = (a: number, b: number): boolean => Math.abs(a - b) <= SAME_TEMPERATURE;

/**
 * Which doping × temperature points were measured. Duplicates and holes are
 * errors (the engine interpolates on a full grid); widely spaced grid lines
 * are warnings, because interpolation across them is a guess.
 */
export function gridCoverage(rows: GridRow[]): { coverage: Coverage; errors: UploadIssue[]; warnings: UploadIssue[] } {
  const dopings = lines(rows.map((r) => r.perCm3), sameDoping);
  const temperatures = lines(rows.map((r) => r.temperature), sameTemperature);
  const owner: number[][] = dopings.map(() => temperatures.map(() => 0));
  const errors: UploadIssue[] = [];
  for (const r of rows) {
    const i = dopings.findIndex((d) => sameDoping(d, r.perCm3));
    const j = temperatures.findIndex((t) => sameTemperature(t, r.temperature));
    if (owner[i]![j]) errors.push({ line: r.line, message: `duplicate point: n = ${r.perCm3.toExponential(3)} cm⁻³ at ${r.temperature} K is already on line ${owner[i]![j]}` });
    else owner[i]![j] = r.line;
  }
  const present = owner.map((row) => row.map((l) => l > 0));
  const missing: string[] = [];
  present.forEach((row, i) => row.forEach((p, j) => {
    if (!p) missing.push(`n = ${dopings[i]!.toExponential(2)} cm⁻³ at ${temperatures[j]} K`);
  }));
  if (rows.length > 0 && dopings.length < 2) errors.push({ message: 'the table needs at least two different carrier concentrations' });
  if (rows.length > 0 && temperatures.length < 2) errors.push({ message: 'the table needs at least two different temperatures' });
  if (missing.length > 0) {
    const shown = missing.slice(0, 5).join('; ');
    errors.push({ message: `the grid has ${missing.length} hole(s) — every carrier concentration must be measured at every temperature; missing: ${shown}${missing.length > 5 ? '; …' : ''}` });
  }
  return { coverage: { dopings, temperatures, present }, errors, warnings: sparseWarnings(dopings, temperatures) };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] ?? 0;
}

function sparseWarnings(dopings: number[], temperatures: number[]): UploadIssue[] {
  const out: UploadIssue[] = [];
  const logs = dopings.map(Math.log10);
  const dGaps = logs.slice(1).map((v, k) => v - logs[k]!);
  const dMedian = median(dGaps);
  dGaps.forEach((g, k) => {
    // Half a decade, or well over the typical spacing: interpolation there is a guess.
    if (g > Math.max(0.5, 2.5 * dMedian)) {
      out.push({ message: `sparse region: no carrier concentration measured between ${dopings[k]!.toExponential(2)} and ${dopings[k + 1]!.toExponential(2)} cm⁻³ (${g.toFixed(2)} decades)` });
    }
  });
  const tGaps = temperatures.slice(1).map((v, k) => v - temperatures[k]!);
  const tMedian = median(tGaps);
  tGaps.forEach((g, k) => {
    if (g > Math.max(25, 2.5 * tMedian)) out.push({ message: `sparse region: no temperature measured between ${temperatures[k]} K and ${temperatures[k + 1]} K` });
  });
  return out;
}
