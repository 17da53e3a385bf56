import { StyleSheet, View } from 'react-native';
import type { RunState } from '@/shared/api/runs';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph, type GlyphName } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

type StateLook = { label: string; glyph: GlyphName; color: string; meaning: string };

/** Each state has a sign and a word; colour only repeats what they say. */
export const runStateLook: Record<RunState, StateLook> = {
  queued: { label: 'Queued', glyph: 'ring', color: colors.textMuted, meaning: 'waiting for a worker' },
  running: { label: 'Running', glyph: 'chevron-right', color: colors.primary, meaning: 'a worker is optimising' },
  succeeded: { label: 'Succeeded', glyph: 'check', color: colors.ok, meaning: 'converged; result stored' },
  failed: { label: 'Failed', glyph: 'cross', color: colors.danger, meaning: 'stopped with an error' },
  cancelled: { label: 'Cancelled', glyph: 'minus', color: colors.heat, meaning: 'stopped on request; best so far kept' },
};

export type RunStateBadgeProps = { state: RunState; size?: 'small' | 'large'; testID?: string };

/** "✓ Succeeded": the run's state as a sign and a word (and, large, what it means). */
export function RunStateBadge({ state, size = 'small', testID }: RunStateBadgeProps) {
  const look = runStateLook[state];
  const large = size === 'large';
  return (
    <View style={[styles.badge, large && styles.large, { borderColor: look.color }]} testID={testID} accessibilityLabel={`State: ${look.label}`}>
      <Glyph name={look.glyph} color={look.color} />
      <AppText variant="label" style={{ color: look.color }}>
        {look.label}
      </AppText>
      {large ? (
        <AppText variant="caption" tone="muted">
          {look.meaning}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xs,
    borderWidth: 1,
    borderRadius: radii.pill,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
    backgroundColor: colors.surface,
  },
  large: { paddingHorizontal: spacing.md, paddingVertical: spacing.xs, flexWrap: 'wrap' },
});
