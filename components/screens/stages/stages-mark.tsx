import { StyleSheet, View } from 'react-native';
import { radii, spacing } from '@/components/theme';
import { gradeColor } from '@/components/ui/graded-strip';

/** The Stages page's motif: three stacked bars, narrow and cold on top, wide and warm below. Decorative. */
export function StagesMark({ size = 40 }: { size?: number }) {
  const shares = [0.35, 0.65, 1];
  return (
    <View style={[styles.mark, { width: size }]} aria-hidden>
      {shares.map((share, i) => (
        <View key={share} style={[styles.bar, { width: share * size, backgroundColor: gradeColor(i / (shares.length - 1)) }]} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  mark: { alignItems: 'center', gap: spacing.xxs },
  bar: { height: 8, borderRadius: radii.sm / 2 },
});
