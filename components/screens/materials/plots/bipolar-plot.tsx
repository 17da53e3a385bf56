import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { BIPOLAR_SHARE, type MaterialFamily } from '@/shared/engine';
import { bipolarOnset, minorityShareVsDoping, type BipolarOnset } from '@/components/charts/bipolar-curves';
import { ChartCard } from '@/components/charts/chart-card';
import { dopingAxis } from '@/components/charts/family-curves';
import { SeriesPlot } from '@/components/charts/series-plot';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { formatNumber, formatScientific, withUnit } from '@/components/format/number';
import { chartMarks, colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

export type BipolarPlotProps = {
  family: MaterialFamily;
  temperatures: number[];
  range: { min: number; max: number };
};

const threshold = `${formatNumber(100 * BIPOLAR_SHARE)} %`;

function onsetText(t: number, onset: BipolarOnset | null): string {
  if (!onset) return '';
  if (onset.kind === 'nowhere') return `At ${t} K: below ${threshold} over the whole range.`;
  if (onset.kind === 'everywhere') return `At ${t} K: bipolar over the whole range.`;
  return `At ${t} K: bipolar below n = ${withUnit(formatScientific(onset.perCm3, 2), 'cm⁻³')}.`;
}

/**
 * The share of the current minority carriers carry against doping, with the
 * 5 % line: below the doping where a curve crosses it the family is bipolar
 * at that temperature (S falls, κ gains the bipolar term).
 */
export function BipolarPlot({ family, temperatures, range }: BipolarPlotProps) {
  const series = useMemo<PlotSeries[]>(
    () => [
      ...temperatures.map((t, i) => ({
        key: `minority-${t}`,
        label: `${t} K`,
        mark: chartMarks[i % chartMarks.length],
        line: minorityShareVsDoping(family, t, range),
      })),
      {
        key: 'threshold',
        label: `${threshold}: bipolar above`,
        mark: { color: colors.danger, dash: 'dashdot', marker: 'square' },
        line: [
          { x: range.min, y: 100 * BIPOLAR_SHARE },
          { x: range.max, y: 100 * BIPOLAR_SHARE },
        ],
      },
    ],
    [family, temperatures, range],
  );
  const onsets = useMemo(() => temperatures.map((t) => ({ t, text: onsetText(t, bipolarOnset(family, t, range)) })), [family, temperatures, range]);
  return (
    <ChartCard fill title="Minority carriers (bipolar conduction)" testID="plot-bipolar">
      <SeriesPlot
        series={series}
        xLabel={dopingAxis}
        yLabel="Minority share of the current σmin/σ (%), log scale"
        xScale="log"
        yScale="log"
        description={`Share of the current carried by minority carriers against net doping at ${temperatures.map((t) => `${t} K`).join(', ')}, with the ${threshold} line above which the family counts as bipolar`}
        note={`Above the ${threshold} line minority carriers lower S and add bipolar heat conduction to κ.`}
      />
      <View style={styles.onsets}>
        {onsets.map((o) => (
          <AppText key={o.t} variant="caption" tone="muted" testID={`bipolar-onset-${o.t}`}>
            {o.text}
          </AppText>
        ))}
      </View>
    </ChartCard>
  );
}

const styles = StyleSheet.create({
  onsets: { gap: spacing.xxs },
});
