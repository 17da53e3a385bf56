import { StyleSheet, View } from 'react-native';
import type { SheetView } from '@/shared/api/growth-documents';
import { formatNumber } from '@/components/format/number';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { kelvin, signedKelvin } from './growth-format';

export type ZoneCountChartProps = { sheet: SheetView; chosen: number };

/** A round step (0.5, 1, 2, 5 × 10^k) giving about `count` ticks over `span`. */
function niceStep(span: number, count: number): number {
  const raw = span / count;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const m = raw / power;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * power;
}

/** The ΔT axis: from just under the worst K to just over the continuous optimum, with round ticks. */
export function deltaTAxis(values: number[]): { lo: number; hi: number; ticks: number[] } {
  const min = Math.min(...values);
  const max = Math.max(...values);
  const step = niceStep(Math.max(max - min, 0.5), 4);
  const lo = Math.floor(min / step) * step;
  const hi = Math.ceil(max / step) * step + (Math.ceil(max / step) * step === max ? step : 0);
  const ticks: number[] = [];
  for (let t = lo; t <= hi + step / 1000; t += step) ticks.push(Number(t.toPrecision(6)));
  return { lo, hi, ticks };
}

const pct = (v: number, lo: number, hi: number) => `${(100 * (v - lo)) / (hi - lo)}%` as const;

/**
 * Predicted ΔT for each zone count K, one row per K, against the
 * continuous profile (dashed line): how much cooling each extra zone buys.
 * The order's K is drawn solid and named.
 */
export function ZoneCountChart({ sheet, chosen }: ZoneCountChartProps) {
  const cont = sheet.continuous.deltaT;
  const { lo, hi, ticks } = deltaTAxis([...sheet.steps.map((s) => s.deltaT), cont]);
  const description = sheet.steps.map((s) => `K ${s.zones}: ${formatNumber(s.deltaT, 3)} K`).join(', ');
  return (
    <View style={styles.wrap} role="img" aria-label={`Predicted ΔT by number of zones: ${description}; continuous profile ${formatNumber(cont, 3)} K`} testID="zone-count-chart">
      {sheet.steps.map((s) => {
        const isChosen = s.zones === chosen;
        return (
          <View key={s.zones} style={styles.row} testID={`zone-count-${s.zones}`}>
            <AppText variant={isChosen ? 'bodyStrong' : 'mono'} style={styles.k}>{`K = ${s.zones}`}</AppText>
            <View style={styles.track}>
              <View style={[styles.reference, { left: pct(cont, lo, hi) }]} />
              <View style={[styles.stem, { width: pct(s.deltaT, lo, hi) }, isChosen && styles.stemChosen]} />
              <View style={[styles.dot, isChosen ? styles.dotChosen : null, { left: pct(s.deltaT, lo, hi) }]} />
            </View>
            <View style={styles.value}>
              <AppText variant={isChosen ? 'bodyStrong' : 'mono'}>{kelvin(s.deltaT)}</AppText>
              <AppText variant="caption" tone="muted">{`${signedKelvin(s.deltaT - cont)}${isChosen ? ' · chosen' : ''}`}</AppText>
            </View>
          </View>
        );
      })}
      <View style={styles.row}>
        <View style={styles.k} />
        <View style={styles.axis}>
          {ticks.map((t, i) => (
            <AppText key={t} variant="caption" tone="muted" style={[styles.tick, { left: pct(t, lo, hi) }]}>
              {i === ticks.length - 1 ? kelvin(t, 4) : formatNumber(t, 4)}
            </AppText>
          ))}
        </View>
        <View style={styles.value} />
      </View>
      <View style={styles.legend}>
        <View style={styles.legendDash} />
        <AppText variant="caption" tone="muted">{`Continuous profile, ΔT ${kelvin(cont)} · filled square: the order's K`}</AppText>
      </View>
    </View>
  );
}

const dot = 12;

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, minHeight: 30 },
  k: { width: 52 },
  track: { flex: 1, height: 24, justifyContent: 'center' },
  reference: { position: 'absolute', top: 0, bottom: 0, width: 0, borderLeftWidth: 1.5, borderStyle: 'dashed', borderColor: colors.text },
  // Lines and marks are borders, not fills: browsers leave backgrounds off paper.
  stem: { height: 0, borderTopWidth: 1, borderColor: colors.border },
  stemChosen: { borderTopWidth: 3, borderColor: colors.text },
  dot: { position: 'absolute', width: dot, height: dot, marginLeft: -dot / 2, borderRadius: dot / 2, borderWidth: 2, borderColor: colors.primary, backgroundColor: colors.surface },
  dotChosen: { borderRadius: radii.sm / 2, borderWidth: (dot + 2) / 2, borderColor: colors.text, width: dot + 2, height: dot + 2, marginLeft: -(dot + 2) / 2 },
  value: { width: 108 },
  axis: { flex: 1, height: 18 },
  tick: { position: 'absolute', width: 48, marginLeft: -24, textAlign: 'center' },
  legend: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm, flexWrap: 'wrap' },
  legendDash: { width: 22, height: 0, borderTopWidth: 1.5, borderStyle: 'dashed', borderColor: colors.text },
});
