import { useMemo } from 'react';
import type { MaterialFamily } from '@/shared/engine';
import {
  curveVsDoping,
  dopingAxis,
  measuredVsDoping,
  quantityInfo,
  type CurveQuantity,
  type TableRow,
} from '@/components/charts/family-curves';
import { SeriesPlot } from '@/components/charts/series-plot';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { chartMarks } from '@/components/theme';
import { ChartCard } from '@/components/charts/chart-card';

export type DopingPlotProps = {
  /** Null: measured points only (the table cannot be interpolated). */
  family: MaterialFamily | null;
  quantity: CurveQuantity;
  temperatures: number[];
  range: { min: number; max: number };
  measured: TableRow[] | null;
};

/** One quantity against doping, one series per chosen temperature. */
export function DopingPlot({ family, quantity, temperatures, range, measured }: DopingPlotProps) {
  const info = quantityInfo[quantity];
  const series = useMemo<PlotSeries[]>(
    () =>
      temperatures.map((t, i) => ({
        key: `${quantity}-${t}`,
        label: `${t} K`,
        mark: chartMarks[i % chartMarks.length],
        line: family ? curveVsDoping(family, quantity, t, range) : [],
        points: measured ? measuredVsDoping(measured, quantity, t) : undefined,
      })),
    [family, quantity, temperatures, range, measured],
  );
  const at = temperatures.map((t) => `${t} K`).join(', ');
  return (
    <ChartCard fill title={info.title} testID={`plot-${quantity}`}>
      <SeriesPlot
        series={series}
        xLabel={dopingAxis}
        yLabel={info.axis}
        xScale="log"
        yScale={info.scale}
        description={`${info.title} against carrier concentration at ${at}${measured ? ', measured points and interpolation' : ', from the band model'}`}
        note={measured ? (family ? 'Markers: measured points. Lines: interpolation between them.' : 'Markers: measured points.') : undefined}
      />
    </ChartCard>
  );
}
