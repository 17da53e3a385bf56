import type { UploadIssue, UploadPreview } from '../api/family-upload';
import { coverageDrawLimit, holesListed } from '../api/family-upload';
import { gridLines, lineOf, sameDoping, sameTemperature } from '../engine/grid-lines';

export type GridRow = { line: number; perCm3: number; temperature: number };
export type Coverage = UploadPreview['coverage'];

/**
 * Which doping × temperature points were measured. Duplicates and holes are
 * errors (the engine interpolates on a full grid); widely spaced grid lines
 * are warnings, because interpolation across them is a guess.
 *
 * Work and memory grow with the rows, not with dopings × temperatures: the
 * measured points are kept in a map, holes are counted (cells − measured) and
 * only the first few are named; the cell-by-cell `present` grid is built only
 * when it is small enough to draw. Callers cap distinct dopings and
 * temperatures first (table-limits.ts).
 */
export function gridCoverage(rows: GridRow[]): { coverage: Coverage; errors: UploadIssue[]; warnings: UploadIssue[] } {
  const dopings = gridLines(rows.map((r) => r.perCm3), sameDoping);
  const temperatures = gridLines(rows.map((r) => r.temperature), sameTemperature);
  const width = temperatures.length;
  const owner = new Map<number, number>();
  const errors: UploadIssue[] = [];
  for (const r of rows) {
    const cell = lineOf(dopings, r.perCm3) * width + lineOf(temperatures, r.temperature);
    const first = owner.get(cell);
    if (first !== undefined) errors.push({ line: r.line, message: `duplicate point: n = ${r.perCm3.toExponential(3)} cm⁻³ at ${r.temperature} K is already on line ${first}` });
    else owner.set(cell, r.line);
  }
  const cells = dopings.length * width;
  const holes = cells - owner.size;
  const firstHoles: Coverage['firstHoles'] = [];
  // Stops at the last listed hole; at most `cells` steps, which the callers' caps bound.
  for (let cell = 0; cell < cells && firstHoles.length < Math.min(holes, holesListed); cell++) {
    if (!owner.has(cell)) firstHoles.push({ perCm3: dopings[Math.floor(cell / width)]!, temperature: temperatures[cell % width]! });
  }
  const present = cells <= coverageDrawLimit ? dopings.map((_, i) => temperatures.map((_, j) => owner.has(i * width + j))) : null;
  if (rows.length > 0 && dopings.length < 2) errors.push({ message: 'the table needs at least two different carrier concentrations' });
  if (rows.length > 0 && temperatures.length < 2) errors.push({ message: 'the table needs at least two different temperatures' });
  if (holes > 0) {
    const shown = firstHoles.map((h) => `n = ${h.perCm3.toExponential(2)} cm⁻³ at ${h.temperature} K`).join('; ');
    errors.push({ message: `the grid has ${holes} hole(s) — every carrier concentration must be measured at every temperature; missing: ${shown}${holes > firstHoles.length ? '; …' : ''}` });
  }
  return {
    coverage: { dopings, temperatures, measured: owner.size, holes, firstHoles, present },
    errors,
    warnings: sparseWarnings(dopings, temperatures),
  };
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
