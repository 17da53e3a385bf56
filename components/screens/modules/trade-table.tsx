import { ScrollView, StyleSheet, View } from 'react-native';
import type { ModuleTrade } from '@/shared/engine';
import { formatNumber } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { limitWords } from '@/components/screens/curves/marked-currents-table';

const heads: [string, string][] = [
  ['N', 'couples'],
  ['Leg area p', 'mm²'],
  ['I at max Qc', 'A'],
  ['V at max Qc', 'V'],
  ['Max Qc', 'W'],
];

/** The N-couple trade: the same total leg area split into other numbers of couples. */
export function TradeTable({ trade }: { trade: ModuleTrade }) {
  return (
    <ScrollView horizontal>
      <View role="table" aria-label="Couples at the same total leg area" testID="trade-table">
        <View role="row" style={styles.row}>
          {heads.map(([h, u]) => (
            <View key={h} role="columnheader" style={styles.cell}>
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
              <AppText key={i} role="cell" variant="mono" style={styles.cell}>
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
  cell: { width: 112, paddingVertical: spacing.xs, paddingRight: spacing.sm },
});
