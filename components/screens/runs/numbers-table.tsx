import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

export type NumbersHead = { key: string; label: string; note: string };
export type NumbersRow = { key: string; label: string; cells: string[] };

/** Things side by side: one column each, one row per quantity (values carry their units). */
export function NumbersTable({ heads, rows, label, testID }: { heads: NumbersHead[]; rows: NumbersRow[]; label: string; testID: string }) {
  return (
    <ScrollView horizontal>
      <View role="table" aria-label={label} testID={testID}>
        <View role="row" style={styles.row}>
          <View style={styles.labelCell} />
          {heads.map((h) => (
            <View key={h.key} role="columnheader" style={styles.cell}>
              <AppText variant="label">{h.label}</AppText>
              <AppText variant="caption" tone="muted">
                {h.note}
              </AppText>
            </View>
          ))}
        </View>
        {rows.map((r) => (
          <View key={r.key} role="row" style={[styles.row, styles.divided]} testID={`${testID}-row-${r.key}`}>
            <AppText role="rowheader" variant="label" tone="muted" style={styles.labelCell}>
              {r.label}
            </AppText>
            {r.cells.map((cell, i) => (
              <AppText key={i} role="cell" variant="mono" style={styles.cell}>
                {cell}
              </AppText>
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start' },
  divided: { borderTopWidth: 1, borderTopColor: colors.border },
  labelCell: { width: 150, paddingVertical: spacing.xs, paddingRight: spacing.sm },
  cell: { width: 190, paddingVertical: spacing.xs, paddingRight: spacing.md },
});
