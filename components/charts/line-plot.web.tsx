import { WithSkiaWeb } from '@shopify/react-native-skia/lib/module/web';
import { ChartBoundary, ChartFrame, ChartLoading } from './chart-frame';
import type { LinePlotProps } from './line-plot-types';

/** CanvasKit's binary, copied into `public/` by metro.config.js. */
const canvasKitOptions = { locateFile: (file: string) => `/${file}` };

const loadCanvas = () => import('./line-plot-canvas');

/**
 * Web: loads CanvasKit after mount, then the Skia/Victory drawing code in
 * its own chunk, so nothing Skia runs at import time or during export.
 */
export function LinePlot(props: LinePlotProps) {
  return (
    <ChartFrame {...props}>
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
