import { ScrollView, StyleSheet, View } from 'react-native';
import type { UploadRow } from '@/shared/api/family-upload';
import { formatNumber, formatScientific } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

export const rowsShown = 50;

type Column = { title: string; width: number; value: (r: UploadRow) => string };

/** The parsed values back in trade units, so a unit slip is visible at a glance. */
const columns: Column[] = [
  { title: 'Line', width: 48, value: (r) => String(r.line) },
  { title: 'n (cm⁻³)', width: 116, value: (r) => formatScientific(r.perCm3, 3) },
  { title: 'T (K)', width: 64, value: (r) => formatNumber(r.temperature, 4) },
  { title: 'S (µV/K)', width: 84, value: (r) => formatNumber(r.seebeck * 1e6, 4) },
  { title: 'σ (S/cm)', width: 92, value: (r) => formatNumber(r.sigma / 100, 4) },
  { title: 'κ (W/(m·K))', width: 100, value: (r) => formatNumber(r.kappa, 3) },
];

/** The first rows as read and converted, and how many there are in all. */
export function RowsTable({ rows, rowCount }: { rows: UploadRow[]; rowCount: number }) {
  const shown = rows.slice(0, rowsShown);
  return (
    <View style={styles.wrap} testID="upload-rows">
      <AppText tone="muted">
        {rowCount > shown.length ? `First ${shown.length} of ${rowCount} rows.` : `All ${rowCount} ${rowCount === 1 ? 'row' : 'rows'}.`}
      </AppText>
      <ScrollView horizontal>
        <View role="table" aria-label="Parsed rows">
          <View style={[styles.row, styles.head]} role="row">
            {columns.map((c) => (
              <AppText key={c.title} variant="monoStrong" tone="muted" style={[styles.cell, { width: c.width }]} role="columnheader">
                {c.title}
              </AppText>
            ))}
          </View>
          {shown.map((r) => (
            <View key={r.line} style={styles.row} role="row">
              {columns.map((c) => (
                <AppText key={c.title} variant="mono" style={[styles.cell, { width: c.width }]} role="cell">
                  {c.value(r)}
                </AppText>
              ))}
            </View>
          ))}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.border, paddingVertical: spacing.xs },
  head: { borderBottomColor: colors.textFaint },
  cell: { paddingRight: spacing.sm, textAlign: 'right' },
});
