import type { ReactNode } from 'react';
import { StyleSheet } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { TitledBlock } from '@/components/ui/titled-block';

export type ChartCardProps = {
  title: string;
  /** How to read the chart, under the title. */
  hint?: string;
  /** In a wrapping row of cards: share the width, at least ~320 px each. */
  inGrid?: boolean;
  /** Take an equal share of a row of cards laid out by the parent (flex: 1). */
  fill?: boolean;
  children: ReactNode;
  testID?: string;
};

/** A titled box around one chart. */
export function ChartCard({ title, hint, inGrid = false, fill = false, children, testID }: ChartCardProps) {
  return (
    <TitledBlock title={title} hint={hint} style={[styles.card, inGrid && styles.gridItem, fill && styles.fill]} testID={testID}>
      {children}
    </TitledBlock>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
  },
  gridItem: { flexGrow: 1, flexBasis: 320, minWidth: 0 },
  fill: { flex: 1 },
});
