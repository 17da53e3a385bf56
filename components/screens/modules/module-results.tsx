import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { parseModuleCase, runModule, type ModuleResult } from '@/shared/engine';
import { SeriesPlot } from '@/components/charts/series-plot';
import { formatNumber } from '@/components/format/number';
import { spacing } from '@/components/theme';
import { CautionNotice } from '@/components/screens/runs/caution-notice';
import { ChartCard } from '@/components/charts/chart-card';
import { MarkedCurrentsTable } from '@/components/screens/curves/marked-currents-table';
import { BlockHeading } from '@/components/ui/block-heading';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { modulePlots, type ModulePlotSpec } from './module-series';
import { TradeTable } from './trade-table';

type Computed = { ok: true; result: ModuleResult } | { ok: false; message: string };

/** The module's curves, computed in the browser from the resolved engine case. */
export function computeModule(moduleCase: Record<string, unknown>): Computed {
  try {
    return { ok: true, result: runModule(parseModuleCase(moduleCase)) };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
}

/** "3 of 40 sampled currents are over the 5 A limit", or null when none is. */
export function overLimitWords(r: ModuleResult): string | null {
  const c = r.versusCurrent;
  const over = c.overLimit.filter(Boolean).length;
  if (c.currentLimit === null || over === 0) return null;
  return `${over} of ${c.currents.length} sampled currents are over the ${formatNumber(c.currentLimit, 3)} A limit (from ${formatNumber(c.currents[c.overLimit.indexOf(true)], 4)} A).`;
}

function PlotGrid({ plots }: { plots: ModulePlotSpec[] }) {
  return (
    <View style={styles.grid}>
      {plots.map((p) => (
        <ChartCard inGrid key={p.key} title={p.title} testID={`module-plot-${p.key}`}>
          <SeriesPlot series={p.series} xLabel={p.xLabel} yLabel={p.yLabel} description={`${p.title}: ${p.series.map((s) => s.label).join(', ')}`} note={p.note} />
        </ChartCard>
      ))}
    </View>
  );
}

export function ModuleResults({ moduleCase }: { moduleCase: Record<string, unknown> }) {
  const computed = useMemo(() => computeModule(moduleCase), [moduleCase]);
  if (!computed.ok) {
    return (
      <Notice tone="warning" title="No curves for this module" testID="module-problem">
        <AppText>{computed.message}</AppText>
      </Notice>
    );
  }
  const r = computed.result;
  const c = r.versusCurrent;
  const over = overLimitWords(r);
  const plots = modulePlots(r);
  return (
    <View style={styles.wrap} testID="module-results">
      <CautionNotice testID="module-caution" />
      <Section title="Marked currents" hint={`${r.module.couples} couples at ΔT = ${formatNumber(c.deltaT, 4)} K, pumping from ${formatNumber(c.pumpingRange[0], 4)} A to ${formatNumber(c.pumpingRange[1], 4)} A.`}>
        <MarkedCurrentsTable rows={[{ key: 'module', label: 'Module', maxHeatLoad: c.maxHeatLoad, maxCop: c.maxCop }]} testID="module-marked" deviceHead={null} />
        {over ? (
          <Notice tone="warning" title="Over the current limit" testID="module-over-limit">
            <AppText>{over}</AppText>
          </Notice>
        ) : null}
      </Section>
      <BlockHeading title="Versus current" hint={`At ΔT = ${formatNumber(c.deltaT, 4)} K and Th = ${formatNumber(c.hotSide, 4)} K.`} />
      <PlotGrid plots={plots.filter((p) => p.group === 'current')} />
      <BlockHeading
        title="Versus ΔT"
        hint={`Each ΔT at its own current of maximum Qc; the module reaches ΔTmax = ${formatNumber(r.versusDeltaT.deltaTMax.hotSide - r.versusDeltaT.deltaTMax.coldSide, 4)} K at ${formatNumber(r.versusDeltaT.deltaTMax.current, 4)} A.`}
      />
      <PlotGrid plots={plots.filter((p) => p.group === 'deltaT')} />
      <Section title="Couples at the same total leg area" hint={`Total leg area ${formatNumber(r.module.totalLegArea * 1e6, 4)} mm²: more couples, higher voltage and lower current.`}>
        <TradeTable trade={r.trade} />
      </Section>
      <PlotGrid plots={plots.filter((p) => p.group === 'trade')} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
