import { ChartBoundary, ChartFrame } from './chart-frame';
import { SeriesLegend } from './series-legend';
import SeriesPlotCanvas from './series-plot-canvas';
import type { SeriesPlotProps } from './series-plot-types';

/** Devices have Skia built in: draw directly (see series-plot.web.tsx for the web). */
export function SeriesPlot(props: SeriesPlotProps) {
  return (
    <ChartFrame {...props} footer={<SeriesLegend series={props.series} note={props.note} />}>
      <ChartBoundary>
        <SeriesPlotCanvas {...props} />
      </ChartBoundary>
    </ChartFrame>
  );
}
