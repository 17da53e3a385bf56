import type { OperatingPoint } from '@/shared/engine';
import { formatNumber } from '@/components/format/number';
import { useIsWide } from '@/components/shell/use-is-wide';
import { DataTable, type DataColumn } from '@/components/ui/data-table';

/** One row: a device (leg or module) and its two marked currents. */
export type MarkedRow = { key: string; label: string; maxHeatLoad: OperatingPoint; maxCop: OperatingPoint | null };

/** One line of the table: a device at one of its marked currents (none: no maximum COP at ΔT = 0 K). */
type Line = { row: MarkedRow; mark: 'qc' | 'cop'; name: string; point: OperatingPoint | null };

const cop = (p: OperatingPoint) => (p.cop === null ? '–' : formatNumber(p.cop, 3));

/** Words, not colour: a point above the user's limit says so in its own cell. */
export const limitWords = (p: OperatingPoint) => (p.overLimit ? `${formatNumber(p.current, 4)} (over the limit)` : formatNumber(p.current, 4));

const value = (f: (p: OperatingPoint) => string, missing = '') => (l: Line) => (l.point ? f(l.point) : missing);

/** The numbers; the current column is wide enough on wide windows for "56.98 (over the limit)" on one line. */
const numbers: DataColumn<Line>[] = [
  { key: 'I', head: 'I', unit: 'A', width: 104, phoneWidth: 84, mono: true, cell: value(limitWords, 'none at ΔT = 0 K') },
  { key: 'Qc', head: 'Qc', unit: 'W', width: 104, phoneWidth: 84, mono: true, cell: value((p) => formatNumber(p.heatLoad, 4)) },
  { key: 'COP', head: 'COP', unit: '–', width: 104, phoneWidth: 84, mono: true, cell: value(cop) },
  { key: 'V', head: 'V', unit: 'V', width: 104, phoneWidth: 84, mono: true, cell: value((p) => formatNumber(p.voltage, 4)) },
  { key: 'P', head: 'P', unit: 'W', width: 104, phoneWidth: 84, mono: true, cell: value((p) => formatNumber(p.power, 4)) },
];

const markColumn: DataColumn<Line> = { key: 'mark', head: 'Marked current', unit: '', width: 132, cell: (l) => l.name };

/** Wide: a column for the device (unless one device is named around the table), one for the mark, then the numbers. */
function wideColumns(deviceHead: string | null): DataColumn<Line>[] {
  const device: DataColumn<Line> = { key: 'device', head: deviceHead ?? '', unit: '', width: 132, cell: (l) => l.row.label };
  return [...(deviceHead === null ? [] : [device]), markColumn, ...numbers];
}

/** Phone: one card per line, titled with the device and its mark, the numbers as labelled lines. */
function phoneColumns(deviceHead: string | null): DataColumn<Line>[] {
  const title: DataColumn<Line> = { key: 'which', head: 'Marked current', width: 0, cell: (l) => (deviceHead === null ? l.name : `${l.row.label} · ${l.name}`) };
  return [title, ...numbers];
}

type TableProps = {
  rows: MarkedRow[];
  testID?: string;
  /** Head of the first column ("Leg"); null leaves the column out (one device, named around the table). */
  deviceHead?: string | null;
};

/**
 * The currents of maximum Qc and of maximum COP with the device there, in A,
 * W and V: a table on wide windows, a card per marked current on a phone
 * (seven columns do not fit beside each other there).
 */
export function MarkedCurrentsTable({ rows, testID = 'marked-currents', deviceHead = 'Leg' }: TableProps) {
  const wide = useIsWide();
  const lines = rows.flatMap((row): Line[] => [
    { row, mark: 'qc', name: 'Maximum Qc', point: row.maxHeatLoad },
    { row, mark: 'cop', name: 'Maximum COP', point: row.maxCop },
  ]);
  return (
    <DataTable
      label="Marked currents"
      testID={testID}
      phone="cards"
      columns={wide ? wideColumns(deviceHead) : phoneColumns(deviceHead)}
      rows={lines}
      rowKey={(l) => `${l.row.key}-${l.mark}`}
      rowTestID={(l) => `${testID}-${l.row.key}-${l.mark}`}
    />
  );
}
