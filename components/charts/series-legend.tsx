import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import type { LineDash, MarkerShape, PlotSeries } from './series-plot-types';

/** Lengths (px) of the drawn pieces of a 28-px line sample. */
const dashPieces: Record<LineDash, number[]> = {
  solid: [28],
  dashed: [8, 8, 8],
  dotted: [2, 2, 2, 2, 2, 2],
  dashdot: [9, 2, 9],
};

function LineSample({ dash, color }: { dash: LineDash; color: string }) {
  return (
    <View style={styles.sample}>
      {dashPieces[dash].map((length, i) => (
        <View key={i} style={[styles.piece, { width: length, backgroundColor: color }]} />
      ))}
    </View>
  );
}

function Marker({ shape, color }: { shape: MarkerShape; color: string }) {
  if (shape === 'star') {
    return <AppText style={[styles.star, { color }]}>★</AppText>;
  }
  return (
    <View style={[styles.marker, shape === 'circle' && styles.round, { backgroundColor: color }]} />
  );
}

const dashWords: Record<LineDash, string> = { solid: 'solid', dashed: 'dashed', dotted: 'dotted', dashdot: 'dash-dot' };

/** The style in words: "dashed", "dashed, squares", "squares". */
function describeMark(s: PlotSeries): string {
  const parts: string[] = [];
  if (s.line.length > 0) parts.push(dashWords[s.mark.dash]);
  if (s.points && s.points.length > 0) parts.push(`${s.mark.marker}s`);
  return parts.join(', ');
}

export type SeriesLegendProps = { series: PlotSeries[]; note?: string };

/** Line style, marker and words for each series: readable without colour. */
export function SeriesLegend({ series, note }: SeriesLegendProps) {
  return (
    <View style={styles.legend} role="list" aria-label="Legend">
      <View style={styles.items}>
        {series.map((s) => (
          <View key={s.key} style={styles.item} role="listitem">
            {s.line.length > 0 ? <LineSample dash={s.mark.dash} color={s.mark.color} /> : null}
            {s.points && s.points.length > 0 ? <Marker shape={s.mark.marker} color={s.mark.color} /> : null}
            <AppText variant="label" style={styles.label}>
              {s.label}
            </AppText>
            <AppText variant="caption" tone="faint">
              {describeMark(s)}
            </AppText>
          </View>
        ))}
      </View>
      {note ? (
        <AppText variant="caption" tone="muted">
          {note}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: {
    gap: spacing.xs,
    paddingTop: spacing.xs,
    borderTopWidth: 1,
    borderTopColor: colors.border,
  },
  items: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg, rowGap: spacing.xs },
  // A long label wraps within the card rather than running past its edge.
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, maxWidth: '100%' },
  label: { flexShrink: 1 },
  sample: { width: 28, height: 3, flexDirection: 'row', justifyContent: 'space-between' },
  piece: { height: 3, borderRadius: 1 },
  marker: { width: 8, height: 8, borderRadius: 1 },
  round: { borderRadius: radii.pill },
  star: { fontSize: 12, lineHeight: 14 },
});
