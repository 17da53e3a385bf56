import { useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { formatNumber, formatScientific } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { AppText } from '@/components/ui/text';
import type { LegProfileData } from './run-result';

type Column = { key: string; head: string; unit: string; cell: (p: LegProfileData, i: number) => string };

const columns: Column[] = [
  { key: 'x', head: 'x', unit: 'mm', cell: (p, i) => formatNumber(p.x[i] * 1e3, 4) },
  { key: 'T', head: 'T', unit: 'K', cell: (p, i) => formatNumber(p.temperature[i], 5) },
  { key: 'n', head: 'n', unit: 'cm⁻³', cell: (p, i) => (p.perCm3 ? formatScientific(p.perCm3[i]) : '–') },
  { key: 'S', head: 'S', unit: 'µV/K', cell: (p, i) => formatNumber(p.seebeck[i] * 1e6, 4) },
  { key: 'sigma', head: 'σ', unit: 'S/cm', cell: (p, i) => formatNumber(p.sigma[i] / 100, 4) },
  { key: 'kappa', head: 'κ', unit: 'W/(m·K)', cell: (p, i) => formatNumber(p.kappa[i], 4) },
  { key: 'zT', head: 'zT', unit: '', cell: (p, i) => formatNumber(p.zT[i], 3) },
];

/** Rows shown before "show all": evenly spaced along the leg, both ends included. */
const shortRows = 21;

export function sampleRows(count: number, wanted: number): number[] {
  if (count <= wanted) return Array.from({ length: count }, (_, i) => i);
  const picked = new Set<number>();
  for (let k = 0; k < wanted; k++) picked.add(Math.round((k * (count - 1)) / (wanted - 1)));
  return [...picked];
}

/** The converged profile as numbers, in trade units; wide tables scroll sideways on a phone. */
export function ProfileTable({ profile }: { profile: LegProfileData }) {
  const [all, setAll] = useState(false);
  const count = profile.x.length;
  const rows = all ? Array.from({ length: count }, (_, i) => i) : sampleRows(count, shortRows);
  return (
    <View style={styles.wrap}>
      <ScrollView horizontal>
        <View role="table" aria-label="Profile along the leg" testID="profile-table">
          <View role="row" style={[styles.row, styles.headRow]}>
            {columns.map((c) => (
              <View key={c.key} role="columnheader" style={styles.cell}>
                <AppText variant="label">{c.head}</AppText>
                <AppText variant="caption" tone="muted">
                  {c.unit || '–'}
                </AppText>
              </View>
            ))}
          </View>
          {rows.map((i) => (
            <View key={i} role="row" style={styles.row}>
              {columns.map((c) => (
                <AppText key={c.key} role="cell" variant="mono" style={styles.cell}>
                  {c.cell(profile, i)}
                </AppText>
              ))}
            </View>
          ))}
        </View>
      </ScrollView>
      {count > shortRows ? (
        <View style={styles.footer}>
          <AppText variant="caption" tone="muted">
            {all ? `All ${count} points of the solution.` : `${rows.length} of ${count} points, evenly spaced along the leg.`}
          </AppText>
          <Button variant="quiet" label={all ? 'Show fewer' : `Show all ${count} points`} onPress={() => setAll(!all)} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.border },
  headRow: { borderTopWidth: 0 },
  cell: { width: 108, paddingVertical: spacing.xs, paddingRight: spacing.sm },
  footer: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
