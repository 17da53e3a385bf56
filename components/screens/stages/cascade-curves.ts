import type { CascadeRunResult } from '@/shared/api/coolers';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { chartMarks } from '@/components/theme';
import { heatUnit } from './stage-table';

/** "3 stages (this cascade)", "2 stages (coldest removed)", "1 stage (two coldest removed)". */
export function curveLabel(stages: number, of: number): string {
  const fewer = of - stages;
  const name = `${stages} ${stages === 1 ? 'stage' : 'stages'}`;
  if (fewer <= 0) return `${name} (this cascade)`;
  return `${name} (${fewer === 1 ? 'coldest' : `${fewer} coldest`} removed)`;
}

/**
 * Heat load against cold-side temperature at the best currents: the
 * cascade, and with one and two stages fewer, one line style each. The
 * heat load in mW when every point is under a watt. The chart's heat axis is
 * logarithmic (fewer stages pump watts where the cascade pumps milliwatts),
 * so it spans four decades below the largest load: a curve falling to no
 * load at its largest ΔT would otherwise stretch it over ten decades of
 * nothing. Points below that floor are left out.
 */
const curveDecades = 4;

export function cascadeCurveSeries(r: CascadeRunResult): { series: PlotSeries[]; unit: 'mW' | 'W' } {
  const { unit, factor } = heatUnit(r.curves.flatMap((c) => c.points.map((p) => p.heatLoad)));
  const of = r.stages.length;
  const sorted = [...r.curves].sort((a, b) => b.stages - a.stages);
  const floor = Math.max(0, ...r.curves.flatMap((c) => c.points.map((p) => (Number.isFinite(p.heatLoad) ? p.heatLoad : 0)))) * 10 ** -curveDecades;
  const series = sorted.map((c, i) => ({
    key: `stages-${c.stages}`,
    label: curveLabel(c.stages, of),
    mark: chartMarks[i % chartMarks.length],
    line: c.points.filter((p) => Number.isFinite(p.heatLoad) && p.heatLoad > 0 && p.heatLoad >= floor).map((p) => ({ x: p.coldSide, y: p.heatLoad * factor })),
  }));
  return { series: series.filter((s) => s.line.length > 0), unit };
}
