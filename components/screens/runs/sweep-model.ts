import type { RunDetail, RunSummary } from '@/shared/api/runs';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { chartMarks } from '@/components/theme';
import { parseRunResult } from './run-result';

/** Runs whose optimum is known (finished with a result), by swept value. */
export function optimumSeries(runs: readonly RunSummary[]): PlotSeries {
  const points = runs
    .filter((r) => r.sweepValue !== null && r.best !== null && (r.state === 'succeeded' || r.state === 'cancelled'))
    .map((r) => ({ x: r.sweepValue as number, y: r.best as number }))
    .sort((a, b) => a.x - b.x);
  return { key: 'optimum', label: 'Graded optimum', mark: chartMarks[0], line: points, points };
}

/** The best uniform leg at each value, from the results already loaded. */
export function uniformSeries(runs: readonly RunSummary[], details: readonly RunDetail[]): PlotSeries {
  const byId = new Map(details.map((d) => [d.run.id, d]));
  const points = runs.flatMap((r) => {
    const parsed = parseRunResult(byId.get(r.id)?.result ?? null);
    const u = parsed?.ok ? parsed.result.baselines?.uniform : undefined;
    return r.sweepValue !== null && u ? [{ x: r.sweepValue, y: u.objective }] : [];
  });
  points.sort((a, b) => a.x - b.x);
  return { key: 'uniform', label: 'Best uniform', mark: chartMarks[1], line: points, points };
}

/** Mean progress over the sweep's runs (finished ones count as done). */
export function sweepFraction(runs: readonly RunSummary[], live: Readonly<Record<string, { fractionDone: number }>>): number {
  if (runs.length === 0) return 0;
  const done = runs.map((r) => (r.state === 'queued' || r.state === 'running' ? (live[r.id]?.fractionDone ?? r.fractionDone) : 1));
  return done.reduce((a, b) => a + b, 0) / runs.length;
}
