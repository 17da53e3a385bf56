import { Children, type ReactNode } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { layout, spacing } from '@/components/theme';

/** Window width from which blocks sit side by side (content width for two columns beside the rail). */
export const sideBySideMinWidth = layout.twoColumnMinWidth + layout.railWidth;

/**
 * Blocks side by side, equal widths, on a wide window; stacked one under
 * the other below it. The equal-width `flex: 1` applies only side by side:
 * in a stack it would give each block a zero basis height and let its
 * content spill over the next block (cards overlapping on a phone).
 */
export function Columns({ children, testID }: { children: ReactNode; testID?: string }) {
  const { width } = useWindowDimensions();
  const side = width >= sideBySideMinWidth;
  return (
    <View style={side ? styles.row : styles.stack} testID={testID}>
      {Children.toArray(children).map((child, i) => (
        <View key={i} style={side ? styles.column : styles.stacked}>
          {child}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: spacing.lg, alignItems: 'flex-start' },
  stack: { gap: spacing.lg },
  column: { flex: 1, minWidth: 0, gap: spacing.lg },
  stacked: { gap: spacing.lg },
});
