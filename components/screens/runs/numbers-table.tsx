import { DataTable, type DataColumn } from '@/components/ui/data-table';

export type NumbersHead = { key: string; label: string; note: string };
export type NumbersRow = { key: string; label: string; cells: string[] };

/**
 * Things side by side: one column each, one row per quantity (values carry
 * their units). On a phone the quantity names stay at the left while the
 * columns scroll, so the second and later runs are one swipe away.
 */
export function NumbersTable({ heads, rows, label, testID }: { heads: NumbersHead[]; rows: NumbersRow[]; label: string; testID: string }) {
  const columns: DataColumn<NumbersRow>[] = [
    { key: 'quantity', head: '', unit: '', width: 150, phoneWidth: 112, cell: (r) => ({ main: r.label }) },
    ...heads.map((h, i): DataColumn<NumbersRow> => ({ key: h.key, head: h.label, unit: h.note, width: 190, phoneWidth: 150, grow: 1, mono: true, cell: (r) => r.cells[i] ?? '–' })),
  ];
  return <DataTable label={label} testID={testID} columns={columns} rows={rows} rowHeaders rowKey={(r) => r.key} rowTestID={(r) => `${testID}-row-${r.key}`} />;
}
