import { Text } from 'react-native';
import type { SeriesPlotProps } from './series-plot-types';

/**
 * Stand-in for `SeriesPlot` in component tests (Skia does not run under
 * jest): prints what the chart would show, series by series, with the
 * number of line points and measured points.
 *
 *   jest.mock('@/components/charts/series-plot', () => jest.requireActual('@/components/charts/test-series-plot'));
 */
export function SeriesPlot({ description, series, xLabel, yLabel }: SeriesPlotProps) {
  const parts = series.map((s) => `${s.label}:${s.line.length}${s.points ? `+${s.points.length}` : ''}`);
  return <Text testID="series-plot">{`${description} | ${yLabel} vs ${xLabel} | ${parts.join(' ')}`}</Text>;
}
