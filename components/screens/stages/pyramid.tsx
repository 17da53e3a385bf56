import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { gradeColor } from '@/components/ui/graded-strip';
import { AppText } from '@/components/ui/text';
import { quantity } from '@/components/screens/runs/run-format';
import { pyramidBars, type PyramidStage } from './pyramid-geometry';

/** Bars narrower than this (px) carry no words inside; the count stays in the label beside them. */
const wordsInsideMin = 96;

const couplesWord = (n: number) => `${n} ${n === 1 ? 'couple' : 'couples'}`;

type Props = {
  stages: readonly PyramidStage[];
  /** The couple count that fills the width (several pyramids side by side share one). */
  scaleCouples?: number;
  /** The heat sink's temperature, under the base. */
  sink?: number;
  compact?: boolean;
  testID?: string;
};

/** Where a stage sits between the coldest and the hottest temperature of the cascade: 0 cold … 1 hot. */
function warmth(s: PyramidStage, lo: number, hi: number): number {
  return hi > lo ? ((s.coldSide + s.hotSide) / 2 - lo) / (hi - lo) : 0.5;
}

/**
 * The cascade drawn to scale: one bar per stage, its width proportional to
 * its couple count, the coldest stage on top (where the detector sits),
 * each labelled with its cold and hot side and its couples. Shaded cold to
 * hot. Drawn with views, so it prints and scales like the zone diagram.
 */
export function Pyramid({ stages, scaleCouples, sink, compact = false, testID = 'pyramid' }: Props) {
  const [trackWidth, setTrackWidth] = useState(0);
  const bars = pyramidBars(stages, scaleCouples);
  const lo = Math.min(...stages.map((s) => s.coldSide));
  const hi = Math.max(...stages.map((s) => s.hotSide));
  const description = bars.map((b) => `stage ${b.number}: ${b.couples} couples, ${quantity(b.coldSide, 'K')} to ${quantity(b.hotSide, 'K')}`).join('; ');
  return (
    <View style={styles.wrap} role="img" aria-label={`Cascade drawn to scale, coldest stage on top: ${description}`} testID={testID}>
      <AppText variant="caption" tone="muted">{`Cold side (load) ${quantity(bars[0]?.coldSide, 'K')}`}</AppText>
      {bars.map((b) => {
        const roomy = b.widthShare * trackWidth >= wordsInsideMin;
        return (
          <View key={b.number} style={styles.row} testID={`${testID}-stage-${b.number}`}>
            <View style={[styles.label, compact && styles.labelCompact]}>
              <AppText variant="label">{`Stage ${b.number}`}</AppText>
              <AppText variant="caption" tone="muted">{`${quantity(b.coldSide, 'K')} → ${quantity(b.hotSide, 'K')}`}</AppText>
              {roomy ? null : <AppText variant="caption">{couplesWord(b.couples)}</AppText>}
            </View>
            <View style={styles.track} onLayout={(e) => setTrackWidth(e.nativeEvent.layout.width)}>
              <View
                style={[styles.bar, { width: `${b.widthShare * 100}%`, backgroundColor: gradeColor(warmth(b, lo, hi)) }]}
                testID={`${testID}-bar-${b.number}`}
              >
                {roomy ? <AppText variant="label" style={styles.barText} numberOfLines={1}>{couplesWord(b.couples)}</AppText> : null}
              </View>
            </View>
          </View>
        );
      })}
      {sink !== undefined ? <AppText variant="caption" tone="muted">{`Heat sink ${quantity(sink, 'K')}`}</AppText> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  label: { width: 118 },
  labelCompact: { width: 112 },
  track: { flex: 1, minWidth: 0, alignItems: 'center' },
  // Outlined, so a bar reads on paper where backgrounds are left off.
  bar: { height: 34, borderWidth: 1.5, borderColor: colors.text, borderRadius: radii.sm, justifyContent: 'center', alignItems: 'center', paddingHorizontal: spacing.xxs },
  barText: { color: colors.text },
});
