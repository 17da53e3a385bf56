import { useMemo, useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import type { MaterialInput } from '@/shared/engine';
import { plotSetup, type CurveQuantity } from '@/components/charts/family-curves';
import { colors, layout, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { BipolarPlot } from './bipolar-plot';
import { DopingPlot } from './doping-plot';
import { OptimumPlot } from './optimum-plot';
import { TemperatureChips } from './temperature-chips';

const allQuantities: CurveQuantity[] = ['seebeck', 'sigma', 'kappa', 'zT'];

export type FamilyPlotsProps = {
  definition: MaterialInput;
  quantities?: CurveQuantity[];
  showOptimum?: boolean;
};

/** Charts in rows of one (phone) or two (wide screens). */
function rowsOf<T>(items: T[], columns: number): T[][] {
  const rows: T[][] = [];
  for (let i = 0; i < items.length; i += columns) rows.push(items.slice(i, i + columns));
  return rows;
}

/**
 * Properties against doping at chosen temperatures, computed here with the
 * engine (band model, or interpolation of a measured table), and the
 * zT-optimal doping against temperature.
 */
export function FamilyPlots({ definition, quantities = allQuantities, showOptimum = true }: FamilyPlotsProps) {
  const setup = useMemo(() => plotSetup(definition), [definition]);
  const [chosen, setChosen] = useState<number[] | null>(null);
  const span = useMemo(() => {
    const choices = setup.ok ? setup.temperatureChoices : [0];
    return { low: choices[0], high: choices[choices.length - 1] };
  }, [setup]);
  const { width } = useWindowDimensions();
  const columns = width >= layout.twoColumnMinWidth + layout.railWidth ? 2 : 1;
  if (!setup.ok) {
    return (
      <View style={styles.notice} role="note">
        <AppText tone="muted">{setup.reason}</AppText>
      </View>
    );
  }
  const choices = setup.temperatureChoices;
  const kept = (chosen ?? []).filter((t) => choices.includes(t));
  const temperatures = kept.length > 0 ? kept : setup.defaultTemperatures;
  const charts = quantities.map((q) => (
    <DopingPlot
      key={q}
      family={setup.family}
      quantity={q}
      temperatures={temperatures}
      range={setup.dopingRange}
      measured={setup.measured}
    />
  ));
  if (setup.family?.minorityShare) {
    charts.push(<BipolarPlot key="bipolar" family={setup.family} temperatures={temperatures} range={setup.dopingRange} />);
  }
  if (showOptimum && setup.family) {
    charts.push(
      <OptimumPlot
        key="optimum"
        family={setup.family}
        temperatures={span}
        range={setup.dopingRange}
        measured={setup.measured}
      />,
    );
  }
  return (
    <View style={styles.plots}>
      <TemperatureChips choices={choices} selected={temperatures} onChange={setChosen} />
      {setup.linesMissing ? (
        <View style={styles.notice} role="note">
          <AppText tone="muted">{setup.linesMissing}</AppText>
        </View>
      ) : null}
      {rowsOf(charts, columns).map((row, i) => (
        <View key={i} style={styles.row}>
          {row}
          {row.length < columns ? <View style={styles.filler} /> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  plots: { gap: spacing.lg },
  row: { flexDirection: 'row', gap: spacing.lg },
  filler: { flex: 1 },
  notice: {
    backgroundColor: colors.surfaceSunken,
    borderRadius: radii.md,
    padding: spacing.lg,
  },
});
