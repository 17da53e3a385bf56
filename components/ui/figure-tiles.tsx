import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from './text';

/** One headline figure; `lead` marks the optimised one (framed, first, and saying "objective"). */
export type FigureTile = { key: string; label: string; value: string; lead?: boolean };

/** A wrapping grid of headline figures, the optimised one first and framed. Test ids: `${prefix}-${key}`. */
export function FigureTiles({ tiles, testID, prefix }: { tiles: readonly FigureTile[]; testID: string; prefix: string }) {
  const sorted = [...tiles.filter((t) => t.lead), ...tiles.filter((t) => !t.lead)];
  return (
    <View style={styles.grid} testID={testID}>
      {sorted.map((t) => (
        <View key={t.key} style={[styles.tile, t.lead && styles.lead]} testID={`${prefix}-${t.key}`}>
          <AppText variant="caption" tone="muted">
            {t.lead ? `${t.label} · objective` : t.label}
          </AppText>
          <AppText variant={t.lead ? 'title' : 'heading'}>{t.value}</AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  tile: {
    flexGrow: 1,
    flexBasis: 150,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.border,
    borderRadius: radii.md,
    padding: spacing.md,
    gap: spacing.xxs,
  },
  lead: { borderColor: colors.primary, borderWidth: 2, flexBasis: 220 },
});
