import { StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/components/theme';
import { AppText } from './text';

export type Fact = { key: string; label: string; value: string };

/** Labelled values, one line each: a record read, not edited (read-only views, design facts). */
export function FactList({ facts, label, testID }: { facts: readonly Fact[]; label: string; testID?: string }) {
  return (
    <View role="list" aria-label={label} testID={testID}>
      {facts.map((row, i) => (
        <View key={row.key} role="listitem" style={[styles.row, i > 0 && styles.divided]} testID={`fact-${row.key}`}>
          <AppText variant="label" tone="muted" style={styles.label}>
            {row.label}
          </AppText>
          <AppText variant="mono" style={styles.value}>
            {row.value}
          </AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: spacing.sm, paddingVertical: spacing.xs },
  divided: { borderTopWidth: 1, borderTopColor: colors.border },
  label: { minWidth: 140 },
  value: { flexShrink: 1, textAlign: 'right' },
});
