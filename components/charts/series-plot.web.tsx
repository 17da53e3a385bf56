import { WithSkiaWeb } from '@shopify/react-native-skia/lib/module/web';
import { ChartBoundary, ChartFrame, ChartLoading } from './chart-frame';
import { SeriesLegend } from './series-legend';
import type { SeriesPlotProps } from './series-plot-types';

/** CanvasKit's binary, copied into `public/` by metro.config.js. */
const canvasKitOptions = { locateFile: (file: string) => `/${file}` };

const loadCanvas = () => import('./series-plot-canvas');

/**
 * Web: loads CanvasKit after mount (once for all charts), then the drawing
 * code in its own chunk, like `LinePlot`. The legend is plain views.
 */
export function SeriesPlot(props: SeriesPlotProps) {
  return (
    <ChartFrame {...props} footer={<SeriesLegend series={props.series} note={props.note} />}>
      <ChartBoundary>
        <WithSkiaWeb
          opts={canvasKitOptions}
          getComponent={loadCanvas}
          fallback={<ChartLoading height={props.height} />}
          componentProps={props}
        />
      </ChartBoundary>
    </ChartFrame>
  );
}
