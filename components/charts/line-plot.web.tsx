import { ChartBoundary, ChartFrame, ChartLoading } from './chart-frame';
import { SkiaWeb } from './skia-web';
import type { LinePlotProps } from './line-plot-types';

const pick = (canvases: typeof import('./chart-canvases')) => canvases.LinePlotCanvas;

/**
 * Web: loads CanvasKit after mount, then the Skia/Victory drawing code in
 * its own chunk, so nothing Skia runs at import time or during export.
 */
export function LinePlot(props: LinePlotProps) {
  return (
    <ChartFrame {...props}>
      <ChartBoundary>
        <SkiaWeb pick={pick} componentProps={props} fallback={<ChartLoading height={props.height} />} />
      </ChartBoundary>
    </ChartFrame>
  );
}
