export type PlotPoint = { x: number; y: number };

export type LinePlotProps = {
  points: PlotPoint[];
  /** Axis captions with units, e.g. "Position along the leg x (mm)". */
  xLabel: string;
  yLabel: string;
  /** What the plot shows, read by screen readers instead of the canvas. */
  description: string;
  /** Height of the drawing area in px. */
  height?: number;
};

export const defaultPlotHeight = 200;
