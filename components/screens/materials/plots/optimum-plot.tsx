import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { propertiesAt, type MaterialFamily } from '@/shared/engine';
import { bestMeasuredVsTemperature, optimumVsTemperature, type TableRow } from '@/components/charts/family-curves';
import { SeriesPlot } from '@/components/charts/series-plot';
import { formatNumber, formatScientific, powerOfTen, withUnit } from '@/components/format/number';
import { chartMarks, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { ChartCard } from '@/components/charts/chart-card';

export type OptimumPlotProps = {
  family: MaterialFamily;
  temperatures: { low: number; high: number };
  range: { min: number; max: number };
  /** Measured rows (tables): the best measured doping at each temperature is marked. */
  measured: TableRow[] | null;
};

/** The doping that maximises zT at each temperature, and the figures at the ends. */
export function OptimumPlot({ family, temperatures, range, measured }: OptimumPlotProps) {
  const curve = useMemo(() => optimumVsTemperature(family, temperatures, range), [family, temperatures, range]);
  // Plot in units of one decade so the axis reads "1.2", "1.4" (× 10¹⁹ cm⁻³).
  const exponent = Math.floor(Math.log10(curve[Math.floor(curve.length / 2)].y));
  const scale = Math.pow(10, exponent);
  const series = [
    {
      key: 'optimum',
      label: 'zT-optimal doping',
      mark: chartMarks[0],
      line: curve.map((p) => ({ x: p.x, y: p.y / scale })),
      points: measured ? bestMeasuredVsTemperature(measured).map((p) => ({ x: p.x, y: p.y / scale })) : undefined,
    },
  ];
  const ends = [curve[0], curve[curve.length - 1]];
  return (
    <ChartCard fill title="zT-optimal doping" testID="plot-optimum">
      <SeriesPlot
        series={series}
        xLabel="Temperature T (K)"
        yLabel={`Optimal n (units of ${powerOfTen(exponent)} cm⁻³)`}
        description={`Doping that maximises zT, from ${temperatures.low} K to ${temperatures.high} K`}
        note={measured ? 'Line: optimum of the interpolation. Markers: best measured doping at each measured temperature.' : undefined}
      />
      <View style={styles.ends}>
        {ends.map((p) => (
          <AppText key={p.x} variant="caption" tone="muted">
            {`At ${formatNumber(p.x)} K: best zT ${formatNumber(propertiesAt(family, p.y, p.x).zT, 2)} at n = ${withUnit(formatScientific(p.y, 2), 'cm⁻³')}`}
          </AppText>
        ))}
      </View>
    </ChartCard>
  );
}

const styles = StyleSheet.create({
  ends: { gap: spacing.xxs },
});
