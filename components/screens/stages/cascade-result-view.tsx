import { StyleSheet, View } from 'react-native';
import type { CascadeRunResult } from '@/shared/api/coolers';
import { coolerCsvUrl } from '@/components/api/coolers';
import { ChartCard } from '@/components/charts/chart-card';
import { SeriesPlot } from '@/components/charts/series-plot';
import { formatNumber } from '@/components/format/number';
import { quantity } from '@/components/screens/runs/run-format';
import { spacing } from '@/components/theme';
import { Columns } from '@/components/ui/columns';
import { DownloadLink } from '@/components/ui/download-link';
import { FigureTiles, type FigureTile } from '@/components/ui/figure-tiles';
import { Section } from '@/components/ui/form-section';
import { cascadeCurveSeries } from './cascade-curves';
import { heatFlow } from './cooler-format';
import { Pyramid } from './pyramid';
import { StageTable } from './stage-table';

function tiles(r: CascadeRunResult): FigureTile[] {
  return [
    { key: 'deltaT', label: 'Temperature drop ΔT', value: quantity(r.deltaT, 'K'), lead: r.objective === 'maxDeltaT' },
    { key: 'coldSide', label: 'Cold side Tc', value: quantity(r.coldSide, 'K') },
    { key: 'heatLoad', label: 'Heat load Qc', value: heatFlow(r.heatLoad) },
    { key: 'power', label: 'Total input power P', value: quantity(r.power, 'W'), lead: r.objective === 'minPower' },
    { key: 'cop', label: 'COP', value: r.cop === null ? '– (no power)' : r.heatLoad === 0 ? '0 (no heat load)' : formatNumber(r.cop, 3) },
  ];
}

/** A cascade run's result: headline figures, the pyramid to scale, the stage table, the heat-load curves and the CSV. */
export function CascadeResultView({ result: r, runId }: { result: CascadeRunResult; runId: string }) {
  const curves = cascadeCurveSeries(r);
  return (
    <View style={styles.wrap} testID="cascade-result">
      <FigureTiles tiles={tiles(r)} testID="cascade-figures" prefix="cascade" />
      <Columns>
        <ChartCard title={`Pyramid: ${r.stages.length} stages, ${r.stages.reduce((n, s) => n + s.couples, 0)} couples`} hint="Drawn to scale: bar width in proportion to the stage's couples; the coldest stage on top, the heat sink below." testID="cascade-pyramid">
          <Pyramid stages={r.stages} sink={r.hotSide} />
        </ChartCard>
        <ChartCard title="Heat load against cold side" hint="At the best currents; the cascade and with its coldest stages removed. Log scale: a detector's milliwatts and a one-stage module's watts on one chart." testID="cascade-curves">
          <SeriesPlot
            series={curves.series}
            yScale="log"
            xLabel="Cold side Tc (K)"
            yLabel={`Qc (${curves.unit})`}
            description={`Heat load against cold-side temperature: ${curves.series.map((s) => s.label).join(', ')}`}
          />
        </ChartCard>
      </Columns>
      <Section title="Stages" hint={`${r.wiring === 'series' ? 'All stages in series on one supply' : 'One supply per stage'}; each stage rejects its heat into the next warmer stage, the warmest into the sink.`}>
        <StageTable result={r} />
        <DownloadLink label="Export cascade CSV" url={coolerCsvUrl(runId, 'cascade')} testID="cascade-csv" />
      </Section>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
});
