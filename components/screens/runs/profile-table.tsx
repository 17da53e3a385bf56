import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { formatNumber, formatScientific } from '@/components/format/number';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { DataTable, type DataColumn } from '@/components/ui/data-table';
import { AppText } from '@/components/ui/text';
import type { LegProfileData } from './run-result';

type Point = { profile: LegProfileData; i: number };

/** Numbers need about 9 characters; a phone gets slimmer columns so the next one peeks in. */
const num = { width: 104, phoneWidth: 92, grow: 1, mono: true } as const;

const columns: DataColumn<Point>[] = [
  { key: 'x', head: 'x', unit: 'mm', ...num, phoneWidth: 72, cell: ({ profile: p, i }) => formatNumber(p.x[i] * 1e3, 4) },
  { key: 'T', head: 'T', unit: 'K', ...num, cell: ({ profile: p, i }) => formatNumber(p.temperature[i], 5) },
  { key: 'n', head: 'n', unit: 'cm⁻³', ...num, width: 120, phoneWidth: 112, cell: ({ profile: p, i }) => (p.perCm3 ? formatScientific(p.perCm3[i]) : '–') },
  { key: 'S', head: 'S', unit: 'µV/K', ...num, cell: ({ profile: p, i }) => formatNumber(p.seebeck[i] * 1e6, 4) },
  { key: 'sigma', head: 'σ', unit: 'S/cm', ...num, cell: ({ profile: p, i }) => formatNumber(p.sigma[i] / 100, 4) },
  { key: 'kappa', head: 'κ', unit: 'W/(m·K)', ...num, cell: ({ profile: p, i }) => formatNumber(p.kappa[i], 4) },
  { key: 'zT', head: 'zT', unit: '–', ...num, cell: ({ profile: p, i }) => formatNumber(p.zT[i], 3) },
];

/** Rows shown before "show all": evenly spaced along the leg, both ends included. */
const shortRows = 21;

export function sampleRows(count: number, wanted: number): number[] {
  if (count <= wanted) return Array.from({ length: count }, (_, i) => i);
  const picked = new Set<number>();
  for (let k = 0; k < wanted; k++) picked.add(Math.round((k * (count - 1)) / (wanted - 1)));
  return [...picked];
}

/** The converged profile as numbers, in trade units; on a phone it scrolls inside its card, x held at the left. */
export function ProfileTable({ profile }: { profile: LegProfileData }) {
  const [all, setAll] = useState(false);
  const count = profile.x.length;
  const rows = all ? Array.from({ length: count }, (_, i) => i) : sampleRows(count, shortRows);
  return (
    <View style={styles.wrap}>
      <DataTable
        label="Profile along the leg"
        testID="profile-table"
        columns={columns}
        rows={rows.map((i) => ({ profile, i }))}
        rowKey={(p) => String(p.i)}
      />
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
  footer: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
