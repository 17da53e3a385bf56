import { StyleSheet, View } from 'react-native';
import { gradeStops } from '@/components/theme';

function channel(hex: string, index: number): number {
  return parseInt(hex.slice(1 + index * 2, 3 + index * 2), 16);
}

/** Colour `t` (0 = cold, 1 = hot) of the cold-to-hot ramp, as `#rrggbb`. */
export function gradeColor(t: number): string {
  const clamped = Math.min(1, Math.max(0, t));
  const parts = [0, 1, 2].map((i) => {
    const cold = channel(gradeStops.cold, i);
    const hot = channel(gradeStops.hot, i);
    return Math.round(cold + (hot - cold) * clamped)
      .toString(16)
      .padStart(2, '0');
  });
  return `#${parts.join('')}`;
}

export type GradedStripProps = {
  /** Number of constant zones, like a stepwise-graded leg. */
  zones?: number;
  direction?: 'row' | 'column';
  thickness?: number;
};

/**
 * Frostgrade's motif: a strip of constant zones stepping from the cold end
 * to the hot end, the way a graded leg is grown. Purely decorative.
 */
export function GradedStrip({ zones = 6, direction = 'row', thickness = 4 }: GradedStripProps) {
  const across = direction === 'row' ? { height: thickness } : { width: thickness };
  return (
    <View style={[styles.strip, { flexDirection: direction }, across]} aria-hidden>
      {Array.from({ length: zones }, (_, i) => (
        <View
          key={i}
          style={[styles.zone, { backgroundColor: gradeColor(zones === 1 ? 0 : i / (zones - 1)) }]}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  strip: { overflow: 'hidden' },
  zone: { flex: 1 },
});
