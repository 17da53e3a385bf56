import { ScrollView, StyleSheet, View } from 'react-native';
import type { OperatingPoint } from '@/shared/engine';
import { formatNumber } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
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

/** The currents of maximum Qc and of maximum COP with the device there, in A, W and V. */
export function MarkedCurrentsTable({ rows, testID = 'marked-currents' }: { rows: MarkedRow[]; testID?: string }) {
  return (
    <ScrollView horizontal>
      <View role="table" aria-label="Marked currents" testID={testID}>
        <View role="row" style={[styles.row, styles.headRow]}>
          {columns.map((c) => (
            <View key={c.key} role="columnheader" style={c.key === 'device' || c.key === 'mark' ? styles.wide : styles.cell}>
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
              <AppText role="cell" style={styles.wide}>
                {r.label}
              </AppText>
              <AppText role="cell" style={styles.wide}>
                {name}
              </AppText>
              {(p ? cells(p) : ['none at ΔT = 0 K', '', '', '', '']).map((text, i) => (
                <AppText key={i} role="cell" variant="mono" style={styles.cell}>
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
});
