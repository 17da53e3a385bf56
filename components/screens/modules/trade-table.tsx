import type { ModuleTrade } from '@/shared/engine';
import { formatNumber } from '@/components/format/number';
import { DataTable, type DataColumn } from '@/components/ui/data-table';
import { limitWords } from '@/components/screens/curves/marked-currents-table';

type TradeRow = ModuleTrade['rows'][number];

/** The current column is wide enough on wide windows for "56.98 (over the limit)" on one line. */
const columns: DataColumn<TradeRow>[] = [
  { key: 'couples', head: 'N', unit: 'couples', width: 72, mono: true, cell: (r) => String(r.couples) },
  { key: 'area', head: 'Leg area p', unit: 'mm²', width: 112, phoneWidth: 96, mono: true, cell: (r) => formatNumber(r.legArea.p * 1e6, 4) },
  { key: 'current', head: 'I at max Qc', unit: 'A', width: 200, phoneWidth: 112, mono: true, cell: (r) => limitWords(r.maxHeatLoad) },
  { key: 'voltage', head: 'V at max Qc', unit: 'V', width: 112, phoneWidth: 96, mono: true, cell: (r) => formatNumber(r.maxHeatLoad.voltage, 4) },
  { key: 'heatLoad', head: 'Max Qc', unit: 'W', width: 112, phoneWidth: 96, mono: true, cell: (r) => formatNumber(r.maxHeatLoad.heatLoad, 4) },
];

/**
 * The N-couple trade: the same total leg area split into other numbers of
 * couples. On a phone it scrolls inside its card, N held at the left.
 */
export function TradeTable({ trade }: { trade: ModuleTrade }) {
  return <DataTable label="Couples at the same total leg area" testID="trade-table" columns={columns} rows={trade.rows} rowKey={(r) => String(r.couples)} />;
}
