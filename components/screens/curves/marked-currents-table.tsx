import { ScrollView, StyleSheet, View } from 'react-native';
import type { OperatingPoint } from '@/shared/engine';
import { formatNumber } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { useIsWide } from '@/components/shell/use-is-wide';
import { AppText } from '@/components/ui/text';

/** One row: a device (leg or module) and its two marked currents. */
export type MarkedRow = { key: string; label: string; maxHeatLoad: OperatingPoint; maxCop: OperatingPoint | null };

type Column = { key: string; head: string; unit: string };

const columns: Column[] = [
  { key: 'device', head: 'Leg', unit: '' },
  { key: 'mark', head: 'Marked current', unit: '' },
  { key: 'I', head: 'I', unit: 'A' },
  { key: 'Qc', head: 'Qc', unit: 'W' },
  { key: 'COP', head: 'COP', unit: '–' },
  { key: 'V', head: 'V', unit: 'V' },
  { key: 'P', head: 'P', unit: 'W' },
];

const cop = (p: OperatingPoint) => (p.cop === null ? '–' : formatNumber(p.cop, 3));

/** Words, not colour: a point above the user's limit says so in its own cell. */
export const limitWords = (p: OperatingPoint) => (p.overLimit ? `${formatNumber(p.current, 4)} (over the limit)` : formatNumber(p.current, 4));

function cells(p: OperatingPoint): string[] {
  return [limitWords(p), formatNumber(p.heatLoad, 4), cop(p), formatNumber(p.voltage, 4), formatNumber(p.power, 4)];
}

type TableProps = {
  rows: MarkedRow[];
  testID?: string;
  /** Head of the first column ("Leg"); null leaves the column out (one device, named around the table). */
  deviceHead?: string | null;
};

/**
 * The currents of maximum Qc and of maximum COP with the device there, in A,
 * W and V. Narrow windows get narrower columns, so the next column peeks in
 * and says the table scrolls sideways.
 */
export function MarkedCurrentsTable({ rows, testID = 'marked-currents', deviceHead = 'Leg' }: TableProps) {
  const wide = useIsWide();
  const labelStyle = wide ? styles.wide : styles.wideNarrow;
  const cellStyle = wide ? styles.cell : styles.cellNarrow;
  const shown = deviceHead === null ? columns.filter((c) => c.key !== 'device') : columns.map((c) => (c.key === 'device' ? { ...c, head: deviceHead } : c));
  return (
    <ScrollView horizontal>
      <View role="table" aria-label="Marked currents" testID={testID}>
        <View role="row" style={[styles.row, styles.headRow]}>
          {shown.map((c) => (
            <View key={c.key} role="columnheader" style={c.key === 'device' || c.key === 'mark' ? labelStyle : cellStyle}>
              <AppText variant="label">{c.head}</AppText>
              <AppText variant="caption" tone="muted">
                {c.unit || ' '}
              </AppText>
            </View>
          ))}
        </View>
        {rows.flatMap((r) => {
          const marks: [string, string, OperatingPoint | null][] = [
            ['qc', 'Maximum Qc', r.maxHeatLoad],
            ['cop', 'Maximum COP', r.maxCop],
          ];
          return marks.map(([k, name, p]) => (
            <View key={`${r.key}-${k}`} role="row" style={styles.row} testID={`${testID}-${r.key}-${k}`}>
              {deviceHead === null ? null : (
                <AppText role="cell" style={labelStyle}>
                  {r.label}
                </AppText>
              )}
              <AppText role="cell" style={labelStyle}>
                {name}
              </AppText>
              {(p ? cells(p) : ['none at ΔT = 0 K', '', '', '', '']).map((text, i) => (
                <AppText key={i} role="cell" variant="mono" style={cellStyle}>
                  {text}
                </AppText>
              ))}
            </View>
          ));
        })}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.border },
  headRow: { borderTopWidth: 0 },
  cell: { width: 104, paddingVertical: spacing.xs, paddingRight: spacing.sm },
  wide: { width: 132, paddingVertical: spacing.xs, paddingRight: spacing.sm },
  cellNarrow: { width: 84, paddingVertical: spacing.xs, paddingRight: spacing.sm },
  wideNarrow: { width: 112, paddingVertical: spacing.xs, paddingRight: spacing.sm },
});
