import { ChartBoundary, ChartFrame, ChartLoading } from './chart-frame';
import { SkiaWeb } from './skia-web';
import { SeriesLegend } from './series-legend';
import type { SeriesPlotProps } from './series-plot-types';

const pick = (canvases: typeof import('./chart-canvases')) => canvases.SeriesPlotCanvas;

/**
 * Web: loads CanvasKit after mount (once for all charts), then the drawing
 * code in its own chunk, like `LinePlot`. The legend is plain views.
 */
export function SeriesPlot(props: SeriesPlotProps) {
  return (
    <ChartFrame {...props} footer={<SeriesLegend series={props.series} note={props.note} />}>
      <ChartBoundary>
        <SkiaWeb pick={pick} componentProps={props} fallback={<ChartLoading height={props.height} />} />
      </ChartBoundary>
    </ChartFrame>
  );
}
