import type { chartMarks } from '@/components/theme';
import type { PlotPoint } from './line-plot-types';

type ThemeMark = (typeof chartMarks)[number];
export type LineDash = ThemeMark['dash'];
export type MarkerShape = ThemeMark['marker'];
/** How one series is drawn; `theme.chartMarks` holds the app's set. */
export type SeriesMark = { color: string; dash: LineDash; marker: MarkerShape };
export type AxisScale = 'linear' | 'log';

/** One curve: a line (model or interpolation) and optionally the measured points behind it. */
export type PlotSeries = {
  key: string;
  /** Legend text with its unit, e.g. "300 K". */
  label: string;
  mark: SeriesMark;
  line: PlotPoint[];
  points?: PlotPoint[];
};

export type SeriesPlotProps = {
  series: PlotSeries[];
  /** Axis captions with units. */
  xLabel: string;
  yLabel: string;
  /** What the plot shows, read by screen readers instead of the canvas. */
  description: string;
  /** `log` plots log10 of the values and labels decades (values must be > 0). */
  xScale?: AxisScale;
  yScale?: AxisScale;
  /** Height of the drawing area in px. */
  height?: number;
  /** A remark under the legend, e.g. what points and lines stand for. */
  note?: string;
};
