import { StyleSheet, View } from 'react-native';
import { SeriesPlot } from '@/components/charts/series-plot';
import { quantity } from '@/components/screens/runs/run-format';
import { spacing } from '@/components/theme';
import { ChartCard } from '@/components/charts/chart-card';
import type { LegCurve } from './curve-model';
import { currentAxis, curveOrder, curveQuantities, curveSeries } from './curve-series';

/** Qc, COP, V and P versus current for every leg that has curves. */
export function CurvePlots({ legs, deltaT }: { legs: LegCurve[]; deltaT: number }) {
  return (
    <View style={styles.grid}>
      {curveOrder.map((q) => {
        const info = curveQuantities[q];
        const series = curveSeries(q, legs);
        return (
          <ChartCard inGrid key={q} title={`${info.title} versus current`} testID={`curve-plot-${q}`}>
            <SeriesPlot
              series={series}
              xLabel={currentAxis}
              yLabel={info.axis}
              description={`${info.title} against current at ΔT = ${quantity(deltaT, 'K')} over the pumping range: ${series.map((s) => s.label).join(', ')}`}
              note="Markers: the currents of maximum Qc and of maximum COP."
            />
          </ChartCard>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
