import type { PlotSeries } from '@/components/charts/series-plot-types';
import type { ModuleResult } from '@/shared/engine';
import { chartMarks } from '@/components/theme';

type Curve = { x: number[]; y: (number | null)[] };

const line = ({ x, y }: Curve) => x.flatMap((xi, i) => (y[i] !== null && Number.isFinite(y[i]) ? [{ x: xi, y: y[i] as number }] : []));

export type ModulePlotGroup = 'current' | 'deltaT' | 'trade';
export type ModulePlotSpec = { key: string; group: ModulePlotGroup; title: string; xLabel: string; yLabel: string; series: PlotSeries[]; note?: string };

/** Within the limit solid, over it dashed with its own legend words: the flag reads without colour. */
function splitByLimit(label: string, x: number[], y: (number | null)[], over: boolean[]): PlotSeries[] {
  const within = { x: x.filter((_, i) => !over[i]), y: y.filter((_, i) => !over[i]) };
  const above = { x: x.filter((_, i) => over[i]), y: y.filter((_, i) => over[i]) };
  const out: PlotSeries[] = [{ key: 'within', label, mark: chartMarks[0], line: line(within) }];
  if (above.x.length > 0) out.push({ key: 'over', label: `${label}, over the current limit`, mark: chartMarks[2], line: [], points: line(above) });
  return out;
}

/**
 * The module's plots: Qc, COP, V, P versus current; Qc, COP, V and I versus
 * ΔT (each ΔT at its current of maximum Qc); voltage against current as N changes.
 */
export function modulePlots(r: ModuleResult): ModulePlotSpec[] {
  const c = r.versusCurrent;
  const byCurrent = (key: string, title: string, yLabel: string, y: (number | null)[]): ModulePlotSpec => ({
    key,
    group: 'current',
    title: `${title} versus current`,
    xLabel: 'Current I (A)',
    yLabel,
    series: splitByLimit(title, c.currents, y, c.overLimit),
  });
  const d = r.versusDeltaT;
  // Each plot names its own legend: a phrase built from the title read "Current at the current of maximum Qc".
  const byDeltaT = (key: string, title: string, legend: string, yLabel: string, y: (number | null)[]): ModulePlotSpec => ({
    key,
    group: 'deltaT',
    title: `${title} versus ΔT`,
    xLabel: 'ΔT (K)',
    yLabel,
    series: splitByLimit(legend, d.deltaT, y, d.overLimit),
  });
  const trade = r.trade.rows.map((row) => ({ x: row.maxHeatLoad.current, y: row.maxHeatLoad.voltage }));
  return [
    byCurrent('heatLoad', 'Heat load Qc', 'Qc (W)', c.heatLoad),
    byCurrent('cop', 'COP', 'COP (dimensionless)', c.cop),
    byCurrent('voltage', 'Voltage', 'V (V)', c.voltage),
    byCurrent('power', 'Input power', 'P (W)', c.power),
    byDeltaT('deltaT', 'Heat load Qc', 'Maximum Qc at each ΔT', 'Qc (W)', d.heatLoad),
    byDeltaT('deltaT-cop', 'COP', 'COP where Qc is largest', 'COP (dimensionless)', d.cop),
    byDeltaT('deltaT-voltage', 'Voltage', 'Voltage where Qc is largest', 'V (V)', d.voltage),
    byDeltaT('deltaT-current', 'Current', 'Current of maximum Qc', 'I (A)', d.currents),
    {
      key: 'trade',
      group: 'trade',
      title: 'Voltage against current as N changes',
      xLabel: 'Current at maximum Qc (A)',
      yLabel: 'Voltage at maximum Qc (V)',
      series: [{ key: 'trade', label: 'N couples, same total area', mark: chartMarks[1], line: trade, points: trade }],
      note: 'One marker per couple count N (see the table).',
    },
  ];
}
