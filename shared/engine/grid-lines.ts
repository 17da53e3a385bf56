/** The grid lines of a measured table: its distinct dopings and temperatures, found by sorting (no grid is built). */

/** Sorted grid lines of `values`: neighbours that are `same` collapse into the first. O(n log n). */
export function gridLines(values: readonly number[], same: (a: number, b: number) => boolean): number[] {
  const lines: number[] = [];
  for (const v of [...values].sort((a, b) => a - b)) if (lines.length === 0 || !same(lines[lines.length - 1]!, v)) lines.push(v);
  return lines;
}

/**
 * The grid line a value fell on: `gridLines` keeps the first value of each
 * cluster and the rest lie above it, so it is the last line at or below the
 * value (binary search, O(log n); lines are sorted).
 */
export function lineOf(lines: readonly number[], value: number): number {
  let lo = 0;
  let hi = lines.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (lines[mid]! <= value) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

/** Same doping within a relative 1e-9; same temperature within 1e-6 K. */
export const sameDoping = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-9 * Math.max(a, b);
export const sameTemperature = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-6;
