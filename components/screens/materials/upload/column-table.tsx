import { StyleSheet, View } from 'react-native';
import type { UploadColumn } from '@/shared/api/family-upload';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

const quantityNames: Record<UploadColumn['quantity'], string> = {
  perCm3: 'Carrier concentration n',
  temperature: 'Temperature T',
  seebeck: 'Seebeck coefficient S',
  sigma: 'Electrical conductivity σ',
  resistivity: 'Resistivity ρ (read as σ = 1/ρ)',
  kappa: 'Thermal conductivity κ',
};

/** Each recognised header: what it measures, in which unit, and how it was converted. */
export function ColumnTable({ columns }: { columns: UploadColumn[] }) {
  if (columns.length === 0) {
    return <AppText tone="muted">No column was recognised.</AppText>;
  }
  return (
    <View role="list" aria-label="Recognised columns" testID="upload-columns">
      {columns.map((c, i) => (
        <View key={c.header} role="listitem" style={[styles.row, i > 0 && styles.divided]}>
          <AppText variant="mono" style={styles.header}>
            {c.header}
          </AppText>
          <View style={styles.meaning}>
            <AppText variant="bodyStrong">{quantityNames[c.quantity]}</AppText>
            <AppText variant="caption" tone="muted">{`Unit ${c.unit} · ${c.toEngine}`}</AppText>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, paddingVertical: spacing.sm },
  divided: { borderTopWidth: 1, borderTopColor: colors.border },
  header: { width: 190 },
  meaning: { flex: 1, minWidth: 180, gap: spacing.xxs },
});
