import { ScrollView, StyleSheet, View } from 'react-native';
import type { ModuleTrade } from '@/shared/engine';
import { formatNumber } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { useIsWide } from '@/components/shell/use-is-wide';
import { AppText } from '@/components/ui/text';
import { limitWords } from '@/components/screens/curves/marked-currents-table';

type Width = 'count' | 'number' | 'current';

const heads: [string, string, Width][] = [
  ['N', 'couples', 'count'],
  ['Leg area p', 'mm²', 'number'],
  ['I at max Qc', 'A', 'current'],
  ['V at max Qc', 'V', 'number'],
  ['Max Qc', 'W', 'number'],
];

/**
 * The N-couple trade: the same total leg area split into other numbers of
 * couples. The current column is wide enough on wide windows for
 * "56.98 (over the limit)" on one line; narrow windows scroll sideways.
 */
export function TradeTable({ trade }: { trade: ModuleTrade }) {
  const wide = useIsWide();
  const width = (w: Width) => [styles.cell, w === 'count' ? styles.count : w === 'current' && wide ? styles.current : styles.number];
  return (
    <ScrollView horizontal>
      <View role="table" aria-label="Couples at the same total leg area" testID="trade-table">
        <View role="row" style={styles.row}>
          {heads.map(([h, u, w]) => (
            <View key={h} role="columnheader" style={width(w)}>
              <AppText variant="label">{h}</AppText>
              <AppText variant="caption" tone="muted">
                {u}
              </AppText>
            </View>
          ))}
        </View>
        {trade.rows.map((r) => (
          <View key={r.couples} role="row" style={[styles.row, styles.line]}>
            {[String(r.couples), formatNumber(r.legArea.p * 1e6, 4), limitWords(r.maxHeatLoad), formatNumber(r.maxHeatLoad.voltage, 4), formatNumber(r.maxHeatLoad.heatLoad, 4)].map((t, i) => (
              <AppText key={i} role="cell" variant="mono" style={width(heads[i][2])}>
                {t}
              </AppText>
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  line: { borderTopWidth: 1, borderTopColor: colors.border },
  cell: { paddingVertical: spacing.xs, paddingRight: spacing.sm },
  count: { width: 72 },
  number: { width: 112 },
  current: { width: 200 },
});
