import { StyleSheet, View } from 'react-native';
import type { MaterialInput } from '@/shared/engine';
import { withUnit } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { parameterRows } from './parameter-rows';

/** The family's numbers in trade units, each with what it means. */
export function ParameterTable({ definition }: { definition: MaterialInput }) {
  const rows = parameterRows(definition);
  return (
    <View role="list" aria-label="Parameters">
      {rows.map((row, i) => (
        <View key={row.key} role="listitem" style={[styles.row, i > 0 && styles.divided]} testID={`param-${row.key}`}>
          <View style={styles.text}>
            <AppText variant="bodyStrong">{row.label}</AppText>
            {row.explanation ? (
              <AppText variant="caption" tone="muted">
                {row.explanation}
              </AppText>
            ) : null}
          </View>
          <AppText variant="mono" style={styles.value}>
            {withUnit(row.value, row.unit)}
          </AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, paddingVertical: spacing.sm, alignItems: 'baseline' },
  divided: { borderTopWidth: 1, borderTopColor: colors.border },
  text: { flex: 1, minWidth: 200, gap: spacing.xxs },
  value: { textAlign: 'right', flexShrink: 0, maxWidth: '100%' },
});
