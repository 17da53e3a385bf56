import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph, type GlyphName } from './glyph';
import { AppText } from './text';

/** How one state shows: a sign and a word; colour only repeats what they say. */
export type StateLook = { label: string; glyph: GlyphName; color: string; meaning: string };

export type StateBadgeProps = {
  look: StateLook;
  size?: 'small' | 'large';
  testID?: string;
  /** What a screen reader says; by default the word and what it means. */
  accessibilityLabel?: string;
};

/** "✓ Approved": a state as a sign and a word (and, large, what it means). */
export function StateBadge({ look, size = 'small', testID, accessibilityLabel }: StateBadgeProps) {
  const large = size === 'large';
  return (
    <View
      style={[styles.badge, large && styles.large, { borderColor: look.color }]}
      testID={testID}
      accessibilityLabel={accessibilityLabel ?? `${look.label}: ${look.meaning}`}
    >
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
