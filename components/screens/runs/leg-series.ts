import type { PlotPoint } from '@/components/charts/line-plot-types';
import type { AxisScale, PlotSeries } from '@/components/charts/series-plot-types';
import { chartMarks } from '@/components/theme';
import type { BaselineProfiles } from './baseline-profiles';
import type { LegProfileData, RunResult } from './run-result';

export type LegQuantity = 'doping' | 'temperature' | 'seebeck' | 'sigma' | 'kappa' | 'zT';

type QuantityInfo = { title: string; axis: string; scale: AxisScale; value: (p: LegProfileData, i: number) => number | undefined };

/** What is plotted along the leg, in the trade's units. */
export const legQuantities: Record<LegQuantity, QuantityInfo> = {
  doping: { title: 'Doping', axis: 'n (cm⁻³), log scale', scale: 'log', value: (p, i) => p.perCm3?.[i] },
  temperature: { title: 'Temperature', axis: 'T (K)', scale: 'linear', value: (p, i) => p.temperature[i] },
  seebeck: { title: 'Seebeck coefficient', axis: 'S (µV/K)', scale: 'linear', value: (p, i) => p.seebeck[i] * 1e6 },
  sigma: { title: 'Electrical conductivity', axis: 'σ (S/cm), log scale', scale: 'log', value: (p, i) => p.sigma[i] / 100 },
  kappa: { title: 'Thermal conductivity', axis: 'κ (W/(m·K))', scale: 'linear', value: (p, i) => p.kappa[i] },
  zT: { title: 'Figure of merit', axis: 'zT (dimensionless)', scale: 'linear', value: (p, i) => p.zT[i] },
};

export const positionAxis = 'Position from the cold end x (mm)';

/** Marks: the optimum solid, the baselines dashed and dotted, so they read without colour. */
export const legMarks = { optimum: chartMarks[0], uniform: chartMarks[1], localBestZt: chartMarks[2] } as const;

function along(profile: LegProfileData, quantity: LegQuantity): PlotPoint[] {
  const value = legQuantities[quantity].value;
  const points: PlotPoint[] = [];
  profile.x.forEach((x, i) => {
    const y = value(profile, i);
    if (y !== undefined && Number.isFinite(y)) points.push({ x: x * 1e3, y });
  });
  return points;
}

/** Baselines' doping is known without solving: the uniform leg is flat, the local-best-zT leg has nodes. */
function baselineDoping(result: RunResult, lengthMm: number): { uniform: PlotPoint[]; local: PlotPoint[] } {
  const b = result.baselines;
  const n = b?.uniform.perCm3;
  const uniform = n === undefined ? [] : [{ x: 0, y: n }, { x: lengthMm, y: n }];
  const local = b?.localBestZt ? b.localBestZt.doping.x.map((f, i) => ({ x: f * lengthMm, y: b.localBestZt!.doping.perCm3[i] })) : [];
  return { uniform, local };
}

/** How many markers a baseline line carries along the leg. */
const baselineMarkers = 6;

/**
 * A few of a line's own points, evenly spread and both ends included: the
 * markers that set the two baselines apart (squares for the best uniform
 * leg, stars for the local-best-zT leg) where their dashes and dots blur
 * at phone size or in print.
 */
export function markersAlong(line: readonly PlotPoint[], count = baselineMarkers): PlotPoint[] {
  if (line.length <= count) return [...line];
  return Array.from({ length: count }, (_, i) => line[Math.round((i * (line.length - 1)) / (count - 1))]);
}

/** A baseline's line with its markers along it. */
function baseline(key: string, label: string, mark: PlotSeries['mark'], line: PlotPoint[]): PlotSeries {
  return { key, label, mark, line, points: markersAlong(line) };
}

/** The optimum and the baselines along the leg for one quantity (series with no points are left out). */
export function legSeries(quantity: LegQuantity, result: RunResult, baselines: BaselineProfiles, lengthMm: number): PlotSeries[] {
  const known = quantity === 'doping' ? baselineDoping(result, lengthMm) : null;
  const optimum = along(result.profile, quantity);
  const nodes = quantity === 'doping' && result.doping ? result.doping.x.map((f, i) => ({ x: f * lengthMm, y: result.doping!.perCm3[i] })) : undefined;
  const series: PlotSeries[] = [
    { key: 'optimum', label: 'Graded optimum', mark: legMarks.optimum, line: optimum, points: nodes },
    baseline('uniform', 'Best uniform', legMarks.uniform, known ? known.uniform : baselines.uniform ? along(baselines.uniform, quantity) : []),
    baseline('local', 'Local-best zT', legMarks.localBestZt, known ? known.local : baselines.localBestZt ? along(baselines.localBestZt, quantity) : []),
  ];
  return series.filter((s) => s.line.length > 0 || (s.points?.length ?? 0) > 0);
}
