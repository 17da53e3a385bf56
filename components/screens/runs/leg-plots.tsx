import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { SeriesPlot } from '@/components/charts/series-plot';
import { spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { baselineProfiles } from './baseline-profiles';
import { quantity } from './run-format';
import { ChartCard } from '@/components/charts/chart-card';
import { legQuantities, legSeries, positionAxis, type LegQuantity } from './leg-series';
import type { RunResult } from './run-result';

const order: LegQuantity[] = ['doping', 'temperature', 'seebeck', 'sigma', 'kappa', 'zT'];

export type LegPlotsProps = {
  result: RunResult;
  runCase: Record<string, unknown>;
  lengthMm: number;
};

/** Six plots along the leg, the graded optimum with both baselines overlaid. */
export function LegPlots({ result, runCase, lengthMm }: LegPlotsProps) {
  // Baseline profiles are solved once per result: a few milliseconds (plus the band tables on first use).
  const baselines = useMemo(() => baselineProfiles(runCase, result), [runCase, result]);
  const hasDoping = result.profile.perCm3 !== undefined;
  return (
    <View style={styles.wrap}>
      <View style={styles.grid}>
        {order
          .filter((q) => q !== 'doping' || hasDoping)
          .map((q) => {
            const info = legQuantities[q];
            const series = legSeries(q, result, baselines, lengthMm);
            return (
              <ChartCard inGrid key={q} title={`${info.title} along the leg`} testID={`leg-plot-${q}`}>
                <SeriesPlot
                  series={series}
                  xLabel={positionAxis}
                  yLabel={info.axis}
                  yScale={info.scale}
                  description={`${info.title} from the cold end (0 mm) to the hot end (${quantity(lengthMm, 'mm')}): ${series.map((s) => s.label).join(', ')}`}
                  note={q === 'doping' && result.doping ? 'Circles: the optimised control points; squares and stars only mark the baselines.' : undefined}
                />
              </ChartCard>
            );
          })}
      </View>
      {baselines.note ? (
        <AppText variant="caption" tone="muted">
          {baselines.note}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
