import { StyleSheet, View } from 'react-native';
import { router, useLocalSearchParams } from 'expo-router';
import type { ModuleDesign, ModuleSummary } from '@/shared/api/modules';
import type { RunDetail } from '@/shared/api/runs';
import { useModuleDetails, useModules } from '@/components/api/modules';
import { isLegRunDetail, useRunDetails, useRuns } from '@/components/api/runs';
import { SeriesPlot } from '@/components/charts/series-plot';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { CautionNotice } from './caution-notice';
import { ChartCard } from '@/components/charts/chart-card';
import { compared, compareRows, compareSeries, parseIds } from './compare-model';
import { comparedModules, moduleCompareRows, moduleCompareSeries } from './compare-modules';
import { ComparePicker } from './compare-picker';
import { NumbersTable } from './numbers-table';

function RunsComparison({ details }: { details: RunDetail[] }) {
  const list = compared(details);
  const doping = compareSeries(list, 'doping');
  const temperature = compareSeries(list, 'temperature');
  return (
    <>
      <Section title="Runs" hint="Each column is one run's optimised leg; every value is a model prediction.">
        <NumbersTable label="Runs side by side" testID="compare-table" heads={list.map((c) => ({ key: c.detail.run.id, label: c.label, note: c.note }))} rows={compareRows(list)} />
      </Section>
      <View style={styles.charts}>
        <ChartCard inGrid title="Doping along the leg" testID="compare-doping">
          <SeriesPlot series={doping} xLabel="Position from the cold end x (mm)" yLabel="n (cm⁻³), log scale" yScale="log" description={`Doping profiles of ${doping.length} runs overlaid`} />
        </ChartCard>
        <ChartCard inGrid title="Temperature along the leg" testID="compare-temperature">
          <SeriesPlot series={temperature} xLabel="Position from the cold end x (mm)" yLabel="T (K)" description={`Temperature profiles of ${temperature.length} runs overlaid`} />
        </ChartCard>
      </View>
    </>
  );
}

function ModulesComparison({ modules, summaries }: { modules: ModuleDesign[]; summaries: readonly ModuleSummary[] }) {
  const list = comparedModules(modules);
  const heatLoad = moduleCompareSeries(list, 'heatLoad');
  const cop = moduleCompareSeries(list, 'cop');
  return (
    <>
      <Section title="Modules" hint="Each column is one saved module at its own hot side and ΔT; the marked currents are found by the optimiser.">
        <NumbersTable label="Modules side by side" testID="compare-modules-table" heads={list.map((m) => ({ key: m.module.id, label: m.label, note: m.module.name }))} rows={moduleCompareRows(list, summaries)} />
      </Section>
      <View style={styles.charts}>
        <ChartCard inGrid title="Module heat load versus current" testID="compare-module-heat-load">
          <SeriesPlot series={heatLoad} xLabel="Current I (A)" yLabel="Qc (W)" description={`Heat load of ${heatLoad.length} modules versus current`} />
        </ChartCard>
        <ChartCard inGrid title="Module COP versus current" testID="compare-module-cop">
          <SeriesPlot series={cop} xLabel="Current I (A)" yLabel="COP (dimensionless)" description={`COP of ${cop.length} modules versus current`} />
        </ChartCard>
      </View>
    </>
  );
}

const count = (n: number, noun: string) => `${n} ${noun}${n === 1 ? '' : 's'}`;

/** Every query has answered, or one failed (shown instead). */
function loaded<T>(queries: Array<{ data?: T; isError: boolean }>): T[] | null {
  const data = queries.flatMap((q) => (q.data ? [q.data] : []));
  return data.length === queries.length ? data : null;
}

/** `/runs/compare?ids=a,b&modules=c`: runs and saved modules side by side, numbers and overlaid curves. */
export function CompareScreen() {
  const params = useLocalSearchParams<{ ids?: string; modules?: string }>();
  const runIds = parseIds(params.ids);
  const moduleIds = parseIds(params.modules);
  const runQueries = useRunDetails(runIds);
  const moduleQueries = useModuleDetails(moduleIds);
  const runList = useRuns();
  const moduleList = useModules();
  const failed = [...runQueries, ...moduleQueries].find((q) => q.isError);
  // Leg runs only: cascades are compared on the Stages page (/stages/compare).
  const details = loaded(runQueries)?.filter(isLegRunDetail) ?? null;
  const modules = loaded(moduleQueries.map((q) => ({ data: q.data?.module, isError: q.isError })));
  const total = runIds.length + moduleIds.length;
  const summaries = moduleList.data?.modules ?? [];
  const setChosen = (next: { runIds: string[]; moduleIds: string[] }) => router.setParams({ ids: next.runIds.join(','), modules: next.moduleIds.join(',') });
  return (
    <ScreenFrame title="Compare" subtitle={`${count(runIds.length, 'run')} and ${count(moduleIds.length, 'module')} side by side`} back={{ label: 'Runs', href: '/runs' }}>
      <ComparePicker runs={runList.data?.runs ?? []} modules={summaries} runIds={runIds} moduleIds={moduleIds} onChange={setChosen} />
      {total < 2 ? <EmptyState title="Pick at least two things" body="Tick finished runs or saved modules above, two or more in all." /> : null}
      {failed?.error ? <ErrorState title="Could not load a run or module" message={failed.error.message} onRetry={() => void failed.refetch()} /> : null}
      {total >= 2 && (!details || !modules) && !failed ? <LoadingState label="Loading…" /> : null}
      {total >= 2 && details && modules ? (
        <>
          <CautionNotice />
          {details.length > 0 ? <RunsComparison details={details} /> : null}
          {modules.length > 0 ? <ModulesComparison modules={modules} summaries={summaries} /> : null}
        </>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  charts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
