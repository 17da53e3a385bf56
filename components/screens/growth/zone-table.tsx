import { StyleSheet, View } from 'react-native';
import type { SheetZone } from '@/shared/api/growth-documents';
import { useIsWide } from '@/components/shell/use-is-wide';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { formatNumber } from '@/components/format/number';
import { bandEdges, microVoltPerK, mm, perCm3, rangeText, siemensPerCm, zoneName } from './growth-format';

export type ZoneTableProps = { rows: SheetZone[]; measureTemperature: number; lossBudget: number };

type Cell = { main: string; sub: string };
type Column = { key: string; head: string; flex: number; cell: (z: SheetZone, last: boolean) => Cell };

function columns(t: number, budget: number): Column[] {
  return [
    { key: 'zone', head: 'Zone', flex: 0.6, cell: (z, last) => ({ main: String(z.index + 1), sub: z.index === 0 ? 'cold end' : last ? 'hot end' : '' }) },
    { key: 'position', head: 'From – to', flex: 1.25, cell: (z) => ({ main: `${formatNumber(z.startMm, 3)}–${mm(z.endMm)}`, sub: `${mm(z.endMm - z.startMm)} long` }) },
    { key: 'target', head: 'Target n', flex: 1.35, cell: (z) => ({ main: perCm3(z.perCm3), sub: '' }) },
    { key: 'band', head: `Band n (loss ≤ ${budget} K)`, flex: 1.5, cell: (z) => ({ main: `${bandEdges(z).low} –\n${bandEdges(z).high} cm⁻³`, sub: '' }) },
    { key: 'seebeck', head: `S at ${t} K`, flex: 1.15, cell: (z) => ({ main: microVoltPerK(z.seebeckUvK), sub: `band ${rangeText(z.seebeckBandUvK, 'µV/K')}` }) },
    { key: 'sigma', head: `σ at ${t} K`, flex: 1.2, cell: (z) => ({ main: siemensPerCm(z.sigmaSCm), sub: `band ${rangeText(z.sigmaBandSCm, 'S/cm')}` }) },
  ];
}

/**
 * The zones the grower makes, cold end first: where each starts and ends,
 * its target carrier concentration, the band that keeps the ΔT loss under
 * the budget, and what S and σ should read at the check temperature. A
 * table on wide screens and on paper, one card per zone on a phone.
 */
export function ZoneTable({ rows, measureTemperature, lossBudget }: ZoneTableProps) {
  const wide = useIsWide();
  const cols = columns(measureTemperature, lossBudget);
  const last = rows.length - 1;
  if (!wide) {
    return (
      <View style={styles.cards} testID="zone-table">
        {rows.map((z, i) => (
          <View key={z.index} style={styles.card} testID={`zone-row-${z.index + 1}`}>
            <AppText variant="bodyStrong">{`${zoneName(z.index)}${i === 0 ? ' · cold end' : i === last ? ' · hot end' : ''}`}</AppText>
            {cols.slice(1).map((c) => {
              const cell = c.cell(z, i === last);
              return (
                <View key={c.key} style={styles.cardLine}>
                  <AppText variant="caption" tone="muted" style={styles.cardTerm}>
                    {c.head}
                  </AppText>
                  <View style={styles.cardValue}>
                    <AppText>{cell.main}</AppText>
                    {cell.sub ? <AppText variant="caption" tone="muted">{cell.sub}</AppText> : null}
                  </View>
                </View>
              );
            })}
          </View>
        ))}
      </View>
    );
  }
  return (
    <View role="table" aria-label="Zones" testID="zone-table">
      <View role="row" style={[styles.row, styles.head]}>
        {cols.map((c) => (
          <AppText key={c.key} role="columnheader" variant="label" style={[styles.cell, { flex: c.flex }]}>
            {c.head}
          </AppText>
        ))}
      </View>
      {rows.map((z, i) => (
        <View key={z.index} role="row" style={styles.row} testID={`zone-row-${z.index + 1}`}>
          {cols.map((c) => {
            const cell = c.cell(z, i === last);
            return (
              <View key={c.key} role="cell" style={[styles.cell, { flex: c.flex }]}>
                <AppText>{cell.main}</AppText>
                {cell.sub ? <AppText variant="caption" tone="muted">{cell.sub}</AppText> : null}
              </View>
            );
          })}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.border },
  head: { borderTopWidth: 0, borderBottomWidth: 2, borderBottomColor: colors.text },
  cell: { paddingVertical: spacing.xs, paddingRight: spacing.sm, gap: spacing.xxs },
  cards: { gap: spacing.sm },
  card: { gap: spacing.xs, padding: spacing.md, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.background },
  cardLine: { flexDirection: 'row', gap: spacing.sm },
  cardTerm: { width: 112, paddingTop: 2 },
  cardValue: { flex: 1 },
});
