import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

export type ProgressBarProps = {
  /** 0–1. */
  fraction: number;
  /** Read by screen readers, e.g. "Run progress". */
  label: string;
  /** Under the bar, e.g. "start 3 of 16 · 42 s". */
  caption?: string;
  compact?: boolean;
  testID?: string;
};

/** A bar with its percentage in words; the fraction is an estimate, and says so in the caption. */
export function ProgressBar({ fraction, label, caption, compact = false, testID }: ProgressBarProps) {
  const clamped = Math.min(1, Math.max(0, Number.isFinite(fraction) ? fraction : 0));
  const percent = Math.round(clamped * 100);
  return (
    <View style={styles.wrap}>
      <View
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        testID={testID}
        style={[styles.track, compact && styles.trackCompact]}
      >
        <View style={[styles.fill, { width: `${clamped * 100}%` }]} />
      </View>
      <View style={styles.captionRow}>
        <AppText variant={compact ? 'caption' : 'label'} style={styles.percent}>{`${percent} %`}</AppText>
        {caption ? (
          <AppText variant="caption" tone="muted" style={styles.caption}>
            {caption}
          </AppText>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  track: {
    height: 12,
    borderRadius: radii.pill,
    backgroundColor: colors.surfaceSunken,
    borderWidth: 1,
    borderColor: colors.border,
    overflow: 'hidden',
  },
  trackCompact: { height: 6 },
  fill: { height: '100%', backgroundColor: colors.primary, borderRadius: radii.pill },
  captionRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.sm },
  percent: { minWidth: 44 },
  caption: { flexShrink: 1 },
});
