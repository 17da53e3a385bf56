import { StyleSheet, View } from 'react-native';
import type { CoupleRunResult } from '@/shared/api/coolers';
import { coolerCsvUrl } from '@/components/api/coolers';
import { ChartCard } from '@/components/charts/chart-card';
import { SeriesPlot } from '@/components/charts/series-plot';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { formatNumber } from '@/components/format/number';
import { objectiveInfo, quantity } from '@/components/screens/runs/run-format';
import { chartMarks, spacing } from '@/components/theme';
import { Columns } from '@/components/ui/columns';
import { DownloadLink } from '@/components/ui/download-link';
import { FigureTiles, type FigureTile } from '@/components/ui/figure-tiles';
import { AppText } from '@/components/ui/text';
import { heatFlow } from './cooler-format';
import { MatchingChart } from './matching-chart';
import { mismatchWords } from './matching-model';

function tiles(r: CoupleRunResult): FigureTile[] {
  const o = r.objective.kind;
  return [
    { key: 'deltaT', label: 'Temperature drop ΔT', value: quantity(r.deltaT, 'K'), lead: o === 'maxDeltaT' },
    { key: 'heatLoad', label: 'Heat load Qc per couple', value: heatFlow(r.heatLoad), lead: o === 'maxHeatLoad' },
    { key: 'cop', label: 'COP', value: r.cop === null ? '– (no power)' : r.heatLoad === 0 ? '0 (no heat load)' : formatNumber(r.cop, 3), lead: o === 'maxCop' },
    { key: 'areaRatio', label: 'Area ratio A_n / A_p', value: formatNumber(r.areaRatio, 4) },
    { key: 'coldSide', label: 'Cold side Tc', value: quantity(r.coldSide, 'K') },
    { key: 'current', label: 'Shared current I', value: quantity(r.current, 'A') },
    { key: 'voltage', label: 'Voltage V', value: quantity(r.voltage, 'V') },
    { key: 'power', label: 'Input power P', value: quantity(r.power, 'W') },
  ];
}

/** Both legs' doping along their own length (mm from the cold end), log scale; a leg of fixed or segmented material has none. */
export function coupleDopingSeries(r: CoupleRunResult): PlotSeries[] {
  return (['p', 'n'] as const).flatMap((side, i) => {
    const leg = r[side];
    const d = leg.doping;
    if (!d) return [];
    const label = `${side}-type leg${leg.optimised ? ', optimised' : ', fixed'}`;
    return [{ key: side, label, mark: chartMarks[i === 0 ? 0 : 2], line: d.x.map((f, k) => ({ x: f * leg.length * 1e3, y: d.perCm3[k] })) }];
  });
}

/** A matched-couple run's result: figures, how far from matched each leg runs and what that costs, both profiles, the CSV. */
export function CoupleResultView({ result: r, runId }: { result: CoupleRunResult; runId: string }) {
  const doping = coupleDopingSeries(r);
  return (
    <View style={styles.wrap} testID="couple-result">
      <FigureTiles tiles={tiles(r)} testID="couple-figures" prefix="couple" />
      <Columns>
        <ChartCard title="How far from matched each leg runs" hint={`One current through both legs; the area ratio ${formatNumber(r.areaRatio, 3)} sets each leg's current density.`} testID="couple-matching">
          <MatchingChart result={r} />
          <AppText testID="mismatch-cost">{mismatchWords(r)}</AppText>
        </ChartCard>
        <ChartCard title="Doping along each leg" hint={`${objectiveInfo[r.objective.kind].goal}; position from each leg's cold end.`} testID="couple-doping">
          {doping.length > 0 ? (
            <SeriesPlot series={doping} xLabel="Position from the cold end x (mm)" yLabel="n (cm⁻³), log scale" yScale="log" description={`Doping profiles of ${doping.map((s) => s.label).join(' and ')}`} />
          ) : (
            <AppText tone="muted">Neither leg has a doping profile (fixed or segmented material).</AppText>
          )}
        </ChartCard>
      </Columns>
      <DownloadLink label="Export couple CSV" url={coolerCsvUrl(runId, 'couple')} testID="couple-csv" />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
});
