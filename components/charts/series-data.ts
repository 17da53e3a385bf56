import type { AxisScale, PlotSeries } from './series-plot-types';

/** One x position of the merged data: `l<i>` is series i's line, `p<i>` its measured point. */
export type SeriesRow = { x: number } & Record<string, number | null>;

export const lineKey = (index: number) => `l${index}`;
export const pointKey = (index: number) => `p${index}`;

function transform(scale: AxisScale, value: number): number | null {
  if (!Number.isFinite(value)) return null;
  if (scale === 'linear') return value;
  return value > 0 ? Math.log10(value) : null;
}

/** Same x within this much (in plotted units) is one row. */
const sameX = 1e-9;

/**
 * Victory draws every series from one table of rows; lines and points of
 * different series sit at different x. This merges them, sorted by x, with
 * `null` where a series has nothing (lines then skip the gap).
 */
export function mergeSeries(series: PlotSeries[], xScale: AxisScale, yScale: AxisScale): SeriesRow[] {
  const keys = series.flatMap((_, i) => [lineKey(i), pointKey(i)]);
  const byX: SeriesRow[] = [];
  const put = (x: number, key: string, y: number) => {
    const tx = transform(xScale, x);
    const ty = transform(yScale, y);
    if (tx === null || ty === null) return;
    let row = byX.find((r) => Math.abs(r.x - tx) <= sameX);
    if (!row) {
      row = { x: tx };
      for (const k of keys) row[k] = null;
      byX.push(row);
    }
    row[key] = ty;
  };
  series.forEach((s, i) => {
    s.line.forEach((p) => put(p.x, lineKey(i), p.y));
    (s.points ?? []).forEach((p) => put(p.x, pointKey(i), p.y));
  });
  return byX.sort((a, b) => a.x - b.x);
}

/** Mantissas of log-axis ticks: 1, 2, 5 per decade on short ranges, decades only on long ones. */
const shortRangeMantissas = [1, 2, 5];
const shortRangeDecades = 2.5;

/**
 * Ticks (as log10 values) inside [min, max] of log10 values: "nice" numbers
 * 1, 2, 5 × 10^k over a short range, whole decades over a long one, and the
 * two ends when nothing nice falls inside.
 */
export function logTicks(values: number[]): number[] {
  const finite = values.filter(Number.isFinite);
  if (finite.length === 0) return [];
  const low = Math.min(...finite);
  const high = Math.max(...finite);
  const mantissas = high - low > shortRangeDecades ? [1] : shortRangeMantissas;
  const ticks: number[] = [];
  for (let k = Math.floor(low); k <= Math.ceil(high); k++) {
    for (const m of mantissas) {
      const t = k + Math.log10(m);
      if (t >= low - 1e-9 && t <= high + 1e-9) ticks.push(t);
    }
  }
  return ticks.length >= 2 ? ticks : [low, high];
}
