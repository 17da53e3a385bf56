import { StyleSheet, View } from 'react-native';
import { LinePlot } from '@/components/charts/line-plot';
import type { PlotPoint } from '@/components/charts/line-plot-types';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

const samplePoints: PlotPoint[] = Array.from({ length: 25 }, (_, i) => {
  const x = i / 24;
  return { x, y: 1 - Math.exp(-3 * x) };
});

/** A client-side check: can this browser draw Frostgrade's charts? */
export function ChartCheck() {
  return (
    <View style={styles.card}>
      <View style={styles.heading}>
        <AppText variant="heading">Charts</AppText>
        <AppText tone="muted">
          A sample curve drawn with the chart engine. If you can see it, plots will work in this
          browser.
        </AppText>
      </View>
      <LinePlot
        points={samplePoints}
        xLabel="sample x (no unit)"
        yLabel="sample y (no unit)"
        description="Sample curve rising from 0 towards 1, drawn to check that charts work"
        height={180}
      />
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
    gap: spacing.md,
  },
  heading: { gap: spacing.xxs },
});
