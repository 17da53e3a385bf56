import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { GradedStrip } from '@/components/ui/graded-strip';
import { AppText } from '@/components/ui/text';

/** Width of the little graded leg in front of the name. */
export const brandLegWidth = 8;

/** Wordmark: a short stepped strip (a graded leg in miniature) and the name. */
export function BrandMark({ tone = 'inverse' }: { tone?: 'inverse' | 'default' }) {
  return (
    <View style={styles.row}>
      <View style={styles.leg}>
        <GradedStrip direction="column" zones={5} thickness={brandLegWidth} />
      </View>
      <AppText variant="heading" tone={tone} style={styles.name}>
        Frostgrade
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  // A row, so the column strip stretches to the full height of the mark.
  leg: { flexDirection: 'row', height: 22, borderRadius: 2, overflow: 'hidden' },
  name: { letterSpacing: 0.3 },
});
