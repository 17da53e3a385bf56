import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import type { Look } from './growth-state';

export type StatusPillProps = { look: Look; size?: 'small' | 'large'; testID?: string };

/** "✓ Approved": a state as a sign and a word (and, large, what it means). */
export function StatusPill({ look, size = 'small', testID }: StatusPillProps) {
  const large = size === 'large';
  return (
    <View style={[styles.pill, large && styles.large, { borderColor: look.color }]} testID={testID} accessibilityLabel={`${look.label}: ${look.meaning}`}>
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
  pill: {
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
