import { lazy, Suspense, useMemo, type ComponentType, type ReactNode } from 'react';

type Canvases = typeof import('./chart-canvases');

let loading: Promise<Canvases> | undefined;

/**
 * CanvasKit's JavaScript, its WebAssembly (`/canvaskit.wasm`, copied into
 * `public/` by metro.config.js) and then the drawing code — fetched once, for
 * all charts, when the first chart mounts. Each `import()` is a chunk of its
 * own and they share no module, so nothing of Skia is in the first download
 * (shared modules would land in a chunk every page loads). Skia's drawing
 * modules read the global CanvasKit as they load, hence the order. A failed
 * fetch is forgotten, so the next chart tries again.
 */
function loadCanvases(): Promise<Canvases> {
  loading ??= (async () => {
    const { LoadSkiaWeb } = await import('@shopify/react-native-skia/lib/module/web/LoadSkiaWeb');
    await LoadSkiaWeb({ locateFile: (file: string) => `/${file}` });
    return import('./chart-canvases');
  })().catch((err: unknown) => {
    loading = undefined;
    throw err;
  });
  return loading;
}

type SkiaWebProps<P> = {
  /** Which drawing, e.g. `(c) => c.LinePlotCanvas`; a module-level constant, read once. */
  pick: (canvases: Canvases) => ComponentType<P>;
  componentProps: P;
  /** Shown while CanvasKit and the drawing code load. */
  fallback: ReactNode;
};

/** A Skia drawing on the web (what `WithSkiaWeb` does, without bundling CanvasKit's loader up front). */
export function SkiaWeb<P extends object>({ pick, componentProps, fallback }: SkiaWebProps<P>) {
  // `pick` is a constant: one lazy component per mount.
  const Drawing = useMemo(() => lazy(async () => ({ default: pick(await loadCanvases()) })), []);
  return (
    <Suspense fallback={fallback}>
      <Drawing {...componentProps} />
    </Suspense>
  );
}
