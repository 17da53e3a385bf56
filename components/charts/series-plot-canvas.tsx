import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { IBMPlexMono_400Regular } from '@expo-google-fonts/ibm-plex-mono/400Regular';
import { DashPathEffect, useFont } from '@shopify/react-native-skia';
import { CartesianChart, Line, Scatter } from 'victory-native';
import { colors } from '@/components/theme';
import { defaultPlotHeight } from './line-plot-types';
import { formatLogTick, formatTick } from '@/components/format/number';
import { lineKey, logTicks, mergeSeries, pointKey } from './series-data';
import type { AxisScale, LineDash, SeriesPlotProps } from './series-plot-types';

const tickFontSize = 11;
const markerRadius = 4.5;

/** Skia dash intervals (on, off, …) per line style; solid has none. */
const dashIntervals: Record<LineDash, number[] | null> = {
  solid: null,
  dashed: [9, 5],
  dotted: [2, 4],
  dashdot: [10, 4, 2, 4],
};

type AxisSetup = {
  tickCount: number;
  tickValues?: number[];
  /** Log axes span exactly the data (ticks alone would widen the domain). */
  domain?: [number, number];
  format: (value: number) => string;
};

function axisSetup(scale: AxisScale, values: number[]): AxisSetup {
  if (scale === 'linear') return { tickCount: 5, format: formatTick };
  const finite = values.filter(Number.isFinite);
  const ticks = logTicks(finite);
  // Victory thins tickValues down to tickCount: ask for all of them.
  const domain: [number, number] | undefined = finite.length > 0 ? [Math.min(...finite), Math.max(...finite)] : undefined;
  return { tickCount: ticks.length, tickValues: ticks, domain, format: formatLogTick };
}

/**
 * The Skia drawing of several series. Import it only through `SeriesPlot`:
 * on the web it must not be evaluated before CanvasKit has loaded.
 */
export default function SeriesPlotCanvas(props: SeriesPlotProps) {
  const { series, xScale = 'linear', yScale = 'linear', height = defaultPlotHeight } = props;
  const font = useFont(IBMPlexMono_400Regular, tickFontSize);
  const data = useMemo(() => mergeSeries(series, xScale, yScale), [series, xScale, yScale]);
  const yKeys = useMemo(() => series.flatMap((_, i) => [lineKey(i), pointKey(i)]), [series]);
  const yValues = data.flatMap((row) => yKeys.map((k) => row[k] ?? Number.NaN));
  const x = axisSetup(xScale, data.map((row) => row.x));
  const y = axisSetup(yScale, yValues);
  if (data.length === 0) return <View style={[styles.canvas, { height }]} />;
  return (
    <View style={[styles.canvas, { height }]}>
      <CartesianChart
        data={data}
        xKey="x"
        yKeys={yKeys}
        domain={{ x: x.domain, y: y.domain }}
        domainPadding={{ top: 10, bottom: 6, left: 8, right: 8 }}
        xAxis={{
          font,
          labelColor: colors.textMuted,
          lineColor: colors.border,
          tickCount: x.tickCount,
          tickValues: x.tickValues,
          formatXLabel: (value) => x.format(Number(value)),
        }}
        yAxis={[
          {
            font,
            labelColor: colors.textMuted,
            lineColor: colors.border,
            tickCount: y.tickCount,
            tickValues: y.tickValues,
            formatYLabel: (value) => y.format(Number(value)),
          },
        ]}
      >
        {({ points }) =>
          series.map((s, i) => {
            const dash = dashIntervals[s.mark.dash];
            return [
              <Line
                key={`${s.key}-line`}
                points={points[lineKey(i)]}
                color={s.mark.color}
                strokeWidth={2.25}
                connectMissingData
              >
                {dash ? <DashPathEffect intervals={dash} /> : null}
              </Line>,
              <Scatter
                key={`${s.key}-points`}
                points={points[pointKey(i)]}
                shape={s.mark.marker}
                radius={s.mark.marker === 'star' ? markerRadius + 1.5 : markerRadius}
                color={s.mark.color}
              />,
            ];
          })
        }
      </CartesianChart>
    </View>
  );
}

const styles = StyleSheet.create({
  canvas: { width: '100%' },
});
