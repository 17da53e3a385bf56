import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

export type ChartCardProps = {
  title: string;
  /** How to read the chart, under the title. */
  hint?: string;
  /** In a wrapping row of cards: share the width, at least ~320 px each. */
  inGrid?: boolean;
  children: ReactNode;
  testID?: string;
};

/** A titled box around one chart. */
export function ChartCard({ title, hint, inGrid = false, children, testID }: ChartCardProps) {
  return (
    <View style={[styles.card, inGrid && styles.gridItem]} testID={testID}>
      <View style={styles.heading}>
        <AppText variant="bodyStrong" role="heading" aria-level={3}>
          {title}
        </AppText>
        {hint ? (
          <AppText variant="caption" tone="muted">
            {hint}
          </AppText>
        ) : null}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
    gap: spacing.sm,
  },
  gridItem: { flexGrow: 1, flexBasis: 320, minWidth: 0 },
  heading: { gap: spacing.xxs },
});
