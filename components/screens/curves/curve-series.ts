import type { PlotSeries } from '@/components/charts/series-plot-types';
import type { OperatingCurve } from '@/shared/engine';
import { chartMarks } from '@/components/theme';
import type { LegCurve, LegKey } from './curve-model';

export type CurveQuantity = 'heatLoad' | 'cop' | 'voltage' | 'power';

type QuantityInfo = { title: string; axis: string; value: (c: OperatingCurve, i: number) => number | null };

/** What is plotted against current, in the trade's units. */
export const curveQuantities: Record<CurveQuantity, QuantityInfo> = {
  heatLoad: { title: 'Heat load Qc', axis: 'Qc (W)', value: (c, i) => c.heatLoad[i] },
  cop: { title: 'Coefficient of performance', axis: 'COP (dimensionless)', value: (c, i) => c.cop[i] },
  voltage: { title: 'Voltage', axis: 'V (V)', value: (c, i) => c.voltage[i] },
  power: { title: 'Input power', axis: 'P (W)', value: (c, i) => c.power[i] },
};

export const curveOrder: CurveQuantity[] = ['heatLoad', 'cop', 'voltage', 'power'];

export const currentAxis = 'Current I (A)';

/** The optimum solid, the baselines dashed and dotted, so they read without colour. */
export const curveMarks: Record<LegKey, PlotSeries['mark']> = { optimum: chartMarks[0], uniform: chartMarks[1], localBestZt: chartMarks[2] };

const pointValue = (q: CurveQuantity, p: OperatingCurve['maxHeatLoad']): number | null =>
  q === 'heatLoad' ? p.heatLoad : q === 'cop' ? p.cop : q === 'voltage' ? p.voltage : p.power;

/** One quantity versus current for each leg that has curves; markers at the currents of maximum Qc and maximum COP. */
export function curveSeries(quantity: CurveQuantity, legs: LegCurve[]): PlotSeries[] {
  const info = curveQuantities[quantity];
  return legs.flatMap((leg) => {
    const c = leg.curve;
    if (!c) return [];
    const line = c.currents.flatMap((x, i) => {
      const y = info.value(c, i);
      return y !== null && Number.isFinite(y) ? [{ x, y }] : [];
    });
    const marked = [c.maxHeatLoad, ...(c.maxCop ? [c.maxCop] : [])];
    const points = marked.flatMap((p) => {
      const y = pointValue(quantity, p);
      return y !== null && Number.isFinite(y) ? [{ x: p.current, y }] : [];
    });
    return [{ key: leg.key, label: leg.label, mark: curveMarks[leg.key], line, points }];
  });
}
