import { StyleSheet, View } from 'react-native';
import type { UploadRow } from '@/shared/api/family-upload';
import { formatNumber, formatScientific } from '@/components/format/number';
import { spacing } from '@/components/theme';
import { DataTable, type DataColumn } from '@/components/ui/data-table';
import { AppText } from '@/components/ui/text';

export const rowsShown = 50;

const num = (head: string, unit: string, width: number, value: (r: UploadRow) => string): DataColumn<UploadRow> => ({ key: head, head, unit, width, align: 'right', mono: true, cell: value });

/** The parsed values back in trade units, so a unit slip is visible at a glance. */
const columns: DataColumn<UploadRow>[] = [
  { key: 'line', head: 'Line', unit: '', width: 48, align: 'right', mono: true, cell: (r) => String(r.line) },
  num('n', 'cm⁻³', 112, (r) => formatScientific(r.perCm3, 3)),
  num('T', 'K', 64, (r) => formatNumber(r.temperature, 4)),
  num('S', 'µV/K', 76, (r) => formatNumber(r.seebeck * 1e6, 4)),
  num('σ', 'S/cm', 84, (r) => formatNumber(r.sigma / 100, 4)),
  num('κ', 'W/(m·K)', 84, (r) => formatNumber(r.kappa, 3)),
];

/** The first rows as read and converted, and how many there are in all. */
export function RowsTable({ rows, rowCount }: { rows: UploadRow[]; rowCount: number }) {
  const shown = rows.slice(0, rowsShown);
  return (
    <View style={styles.wrap} testID="upload-rows">
      <AppText tone="muted">
        {rowCount > shown.length ? `First ${shown.length} of ${rowCount} rows.` : `All ${rowCount} ${rowCount === 1 ? 'row' : 'rows'}.`}
      </AppText>
      <DataTable label="Parsed rows" columns={columns} rows={shown} rowKey={(r) => String(r.line)} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
});
