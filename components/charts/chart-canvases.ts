// Both Skia drawings behind one module, imported only dynamically (by
// line-plot.web.tsx and series-plot.web.tsx), so the web export puts Skia,
// Victory, Reanimated and d3 into one chunk fetched with the first chart.
// Two separate dynamic imports would make the exporter move what they share
// into a "__common" chunk that index.html loads on every page, charts or not.
export { default as LinePlotCanvas } from './line-plot-canvas';
export { default as SeriesPlotCanvas } from './series-plot-canvas';
