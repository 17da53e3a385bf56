import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDto } from '@/shared/api/growth';
import { yieldBasis, type SheetView, type YieldView } from '@/shared/api/growth-documents';
import { SeriesPlot } from '@/components/charts/series-plot';
import type { PlotPoint } from '@/components/charts/line-plot-types';
import { formatNumber } from '@/components/format/number';
import { chartMarks, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { kelvin } from './growth-format';

/**
 * The histogram as a closed staircase: Victory draws one y per x, so each
 * bin edge is two points a hair apart (the rise and the fall).
 */
export function histogramOutline(y: YieldView): PlotPoint[] {
  const { edges, counts } = y.histogram;
  const hair = ((edges[edges.length - 1]! - edges[0]!) || 1) * 1e-5;
  const out: PlotPoint[] = [{ x: edges[0]!, y: 0 }];
  counts.forEach((c, b) => {
    out.push({ x: edges[b]! + hair, y: c }, { x: edges[b + 1]! - hair, y: c });
  });
  out.push({ x: edges[edges.length - 1]!, y: 0 });
  return out;
}

/** "97.7 %". */
export const percent = (fraction: number) => `${formatNumber(100 * fraction, 3)} %`;

export type YieldBlockProps = { order: GrowthOrderDto; sheet: SheetView; yieldEstimate: YieldView | undefined };

/**
 * How many as-grown legs would meet the budget at the grower's doping
 * scatter: the percentage, the scatter and sample count it came from, and
 * the simulated ΔT (objective) as a histogram against the budget's edge.
 */
export function YieldBlock({ order, sheet, yieldEstimate: y }: YieldBlockProps) {
  if (!y) return <AppText tone="muted">{'This sheet was computed before yields existed: change the loss budget or the doping scatter to compute one.'}</AppText>;
  const unit = sheet.unit || '';
  const edge = y.target - y.budget;
  const top = Math.max(...y.histogram.counts, 1);
  const computing = order.yieldStatus === 'computing';
  return (
    <View style={styles.wrap} testID="yield-block">
      <View style={styles.headline}>
        <AppText variant="heading" testID="yield-percent">{percent(y.meetsBudget)}</AppText>
        <AppText style={styles.grow} testID="yield-note">{`${yieldBasis(y, unit)}.`}</AppText>
      </View>
      <AppText variant="caption" tone="muted">
        {`Simulated ΔT 5 % / 50 % / 95 %: ${formatNumber(y.p05, 4)} / ${formatNumber(y.p50, 4)} / ${formatNumber(y.p95, 4)} ${unit} (design ${formatNumber(y.target, 4)} ${unit}); each zone's log10 n drawn independently around its target, zone lengths exact, at the design current; seed ${y.seed}.${y.infeasible ? ` ${y.infeasible} legs had no steady state and count as failing.` : ''}`}
      </AppText>
      {computing ? <AppText tone="muted" testID="yield-stale">{`Shown for ${y.scatterDecades} decades until the yield at ${order.dopingScatter} decades is ready.`}</AppText> : null}
      <SeriesPlot
        xLabel={`Predicted ΔT of the as-grown leg (${unit || 'objective'})`}
        yLabel="Simulated legs"
        height={170}
        description={`Histogram of ${y.samples} simulated as-grown legs: ΔT from ${formatNumber(y.histogram.edges[0]!, 4)} to ${formatNumber(y.histogram.edges[y.histogram.edges.length - 1]!, 4)} ${unit}; ${percent(y.meetsBudget)} above the budget's edge at ${formatNumber(edge, 4)} ${unit}`}
        series={[
          { key: 'legs', label: `As-grown legs (${y.samples})`, mark: chartMarks[0], line: histogramOutline(y) },
          { key: 'edge', label: `Budget edge: design − ${kelvin(y.budget)}`, mark: chartMarks[2], line: [{ x: edge, y: 0 }, { x: edge + 1e-9 * Math.max(1, Math.abs(edge)) * 10, y: top }] },
          { key: 'design', label: 'Design', mark: chartMarks[1], line: [], points: [{ x: y.target, y: 0 }] },
        ]}
        note={`Legs right of the dotted edge lose no more than the budget.${y.histogram.below ? ` ${y.histogram.below} legs below ${formatNumber(y.histogram.edges[0]!, 4)} ${unit} are counted but not drawn.` : ''}`}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  headline: { flexDirection: 'row', alignItems: 'baseline', gap: spacing.sm, flexWrap: 'wrap' },
  grow: { flexShrink: 1 },
});
