import { StyleSheet, View } from 'react-native';
import type { CoupleRunResult } from '@/shared/api/coolers';
import { formatNumber } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { legMatches, matchAxisMax, offByWords } from './matching-model';

const pct = (v: number, max: number) => `${(100 * v) / max}%` as const;
const density = (v: number) => `${formatNumber(v, 3)} A/cm²`;

/**
 * Each leg's current density on one axis: a ring at the leg's own best, a
 * filled square where the shared current puts it. The gap between them is
 * how far from matched the leg runs; the area ratio closes it as far as the
 * other leg allows.
 */
export function MatchingChart({ result }: { result: CoupleRunResult }) {
  const matches = legMatches(result);
  const max = matchAxisMax(matches);
  return (
    <View style={styles.wrap} role="img" aria-label={matches.map((m) => `${m.side}-type leg at ${density(m.shared)}, own best ${density(m.own)}: ${offByWords(m.offBy)}`).join('; ')} testID="matching-chart">
      {matches.map((m) => (
        <View key={m.side} style={styles.leg} testID={`matching-${m.side}`}>
          <AppText variant="label">{`${m.side}-type leg ${offByWords(m.offBy)}`}</AppText>
          <View style={styles.track}>
            <View style={styles.axisLine} />
            <View style={[styles.stem, { left: pct(Math.min(m.shared, m.own), max), width: pct(Math.abs(m.shared - m.own), max) }]} />
            <View style={[styles.own, { left: pct(m.own, max) }]} />
            <View style={[styles.shared, { left: pct(m.shared, max) }]} />
          </View>
          <AppText variant="mono" tone="muted">{`shared ${density(m.shared)} · own best ${density(m.own)}`}</AppText>
        </View>
      ))}
      <AppText variant="caption" tone="muted">{`Current density J from 0 to ${density(max)}. Ring: the leg's own best; filled square: where the shared current puts it.`}</AppText>
    </View>
  );
}

const mark = 14;

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  leg: { gap: spacing.xs },
  track: { height: 22, justifyContent: 'center' },
  // Lines and marks are borders, not fills: browsers leave backgrounds off paper.
  axisLine: { height: 0, borderTopWidth: 1, borderColor: colors.border },
  stem: { position: 'absolute', height: 0, borderTopWidth: 3, borderColor: colors.heat },
  own: { position: 'absolute', width: mark, height: mark, marginLeft: -mark / 2, borderRadius: mark / 2, borderWidth: 2, borderColor: colors.primary, backgroundColor: colors.surface },
  shared: { position: 'absolute', width: mark - 2, height: mark - 2, marginLeft: -(mark - 2) / 2, borderWidth: (mark - 2) / 2, borderColor: colors.text },
});
