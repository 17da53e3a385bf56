import { StyleSheet, useWindowDimensions, View } from 'react-native';
import type { FamilySummary } from '@/shared/api/families';
import { layout, spacing } from '@/components/theme';
import { FamilyCard } from './family-card';

/** Cards one per row on narrow screens, two per row when there is room. */
export function FamilyGrid({ families }: { families: FamilySummary[] }) {
  const { width } = useWindowDimensions();
  const columns = width >= layout.twoColumnMinWidth + layout.railWidth ? 2 : 1;
  const rows: FamilySummary[][] = [];
  for (let i = 0; i < families.length; i += columns) rows.push(families.slice(i, i + columns));
  return (
    <View style={styles.grid} role="list" aria-label="Material families">
      {rows.map((row) => (
        <View key={row[0].id} style={styles.row}>
          {row.map((family) => (
            <View key={family.id} style={styles.cell} role="listitem">
              <FamilyCard family={family} />
            </View>
          ))}
          {row.length < columns ? <View style={styles.cell} /> : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: spacing.lg },
  row: { flexDirection: 'row', gap: spacing.lg },
  cell: { flex: 1 },
});
