import { ChartBoundary, ChartFrame } from './chart-frame';
import LinePlotCanvas from './line-plot-canvas';
import type { LinePlotProps } from './line-plot-types';

/** Devices have Skia built in: draw directly (see line-plot.web.tsx for the web). */
export function LinePlot(props: LinePlotProps) {
  return (
    <ChartFrame {...props}>
      <ChartBoundary>
        <LinePlotCanvas {...props} />
      </ChartBoundary>
    </ChartFrame>
  );
}
