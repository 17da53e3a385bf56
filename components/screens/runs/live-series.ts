import type { RunDetail, RunProgress } from '@/shared/api/runs';
import type { PlotPoint } from '@/components/charts/line-plot-types';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import type { TracePoint } from '@/components/realtime/use-run-progress';
import { chartMarks } from '@/components/theme';

/** The stored trace, then the live reports that came after it (by elapsed time). */
export function mergeTrace(stored: readonly TracePoint[], live: readonly TracePoint[]): TracePoint[] {
  const last = stored.length > 0 ? stored[stored.length - 1].seconds : -Infinity;
  return [...stored, ...live.filter((p) => p.seconds > last)];
}

/** At most `max` points, evenly picked, the last always kept: charts stay quick on long runs. */
export function thin<T>(points: readonly T[], max: number): T[] {
  if (points.length <= max) return [...points];
  const step = points.length / max;
  const out: T[] = [];
  for (let k = 0; k < max - 1; k++) out.push(points[Math.floor(k * step)]);
  out.push(points[points.length - 1]);
  return out;
}

const maxChartPoints = 400;

/**
 * Below this a tried point is off the chart: a random start can begin far
 * below the best (even at a negative ΔT), and one such point would squash
 * the best-so-far line flat.
 */
export function objectiveFloor(trace: readonly TracePoint[]): number {
  const best = trace.map((p) => p.best).filter(Number.isFinite);
  if (best.length === 0) return -Infinity;
  const low = Math.min(...best);
  const high = Math.max(...best);
  return low - Math.max(high - low, 0.25 * Math.abs(high));
}

/** Best so far as a line and each report's objective as markers, against elapsed time; `hidden` counts points below the floor. */
export function objectiveSeries(trace: readonly TracePoint[]): { series: PlotSeries[]; hidden: number } {
  const shown = thin(trace, maxChartPoints);
  const floor = objectiveFloor(shown);
  const tried = shown.filter((p) => p.objective >= floor);
  return {
    series: [
      { key: 'best', label: 'Best so far', mark: chartMarks[0], line: shown.map((p) => ({ x: p.seconds, y: p.best })) },
      { key: 'latest', label: 'Point being tried', mark: chartMarks[2], line: [], points: tried.map((p) => ({ x: p.seconds, y: p.objective })) },
    ],
    hidden: shown.length - tried.length,
  };
}

/** The profile the optimiser holds now, between the grower's doping bounds. */
export function liveDopingSeries(progress: RunProgress | null, design: RunDetail['design']): PlotSeries[] {
  const L = design.lengthMm;
  const bound = (n: number): PlotPoint[] => [{ x: 0, y: n }, { x: L, y: n }];
  const series: PlotSeries[] = [
    { key: 'max', label: 'Highest doping allowed', mark: chartMarks[1], line: bound(design.maxPerCm3) },
    { key: 'min', label: 'Lowest doping allowed', mark: chartMarks[3], line: bound(design.minPerCm3) },
  ];
  const d = progress?.doping;
  if (d && d.x.length > 0) {
    const line = d.x.map((f, i) => ({ x: f * L, y: d.perCm3[i] }));
    series.unshift({ key: 'now', label: 'Current profile', mark: chartMarks[0], line, points: line });
  }
  return series;
}
