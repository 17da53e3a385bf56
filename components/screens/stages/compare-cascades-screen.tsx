import { StyleSheet, View } from 'react-native';
import { router, useLocalSearchParams } from 'expo-router';
import { hasResult, isCoolerRunDetail, useRunDetails, useRuns } from '@/components/api/runs';
import { ChartCard } from '@/components/charts/chart-card';
import { CautionNotice } from '@/components/screens/runs/caution-notice';
import { parseIds, toggled } from '@/components/screens/runs/compare-model';
import { NumbersTable } from '@/components/screens/runs/numbers-table';
import { runChoiceLabel, runName } from '@/components/screens/runs/run-format';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Section } from '@/components/ui/form-section';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { cascadeHeads, cascadeRows, comparedCascades } from './compare-cascades-model';
import { Pyramid } from './pyramid';
import { sharedScale } from './pyramid-geometry';

/** `/stages/compare?ids=a,b`: finished cascade runs side by side, numbers and pyramids on one scale. */
export function CompareCascadesScreen() {
  const ids = parseIds(useLocalSearchParams<{ ids?: string }>().ids);
  const runs = useRuns();
  const queries = useRunDetails(ids);
  const failed = queries.find((q) => q.isError);
  const loaded = queries.flatMap((q) => (q.data && isCoolerRunDetail(q.data) ? [q.data] : []));
  const ready = queries.every((q) => q.data !== undefined);
  const list = comparedCascades(loaded);
  const scale = sharedScale(list.map((c) => c.result?.stages ?? []));
  const offered = (runs.data?.runs ?? []).filter((r) => r.kind === 'cascade' && (hasResult(r) || ids.includes(r.id)));
  return (
    <ScreenFrame title="Compare cascades" subtitle={`${list.length} cascade ${list.length === 1 ? 'run' : 'runs'} side by side`} back={{ label: 'Stages', href: '/stages' }}>
      <Section title="In this comparison" hint="Finished cascade runs, up to four.">
        <View style={styles.chips} testID="compare-pick-cascades">
          {runs.isPending ? <AppText tone="muted">Loading runs…</AppText> : null}
          {runs.data && offered.length === 0 ? <AppText tone="muted">No finished cascade runs yet.</AppText> : null}
          {offered.map((r) => (
            <Chip key={r.id} label={runChoiceLabel(r)} selected={ids.includes(r.id)} onPress={() => router.setParams({ ids: toggled(ids, r.id).join(',') })} testID={`pick-cascade-${r.id}`} />
          ))}
        </View>
      </Section>
      {ids.length < 2 ? <EmptyState title="Pick at least two cascade runs" body="Tick finished cascade runs above to see their stages, temperatures, power and pyramids side by side." /> : null}
      {failed?.error ? <ErrorState title="Could not load a run" message={failed.error.message} onRetry={() => void failed.refetch()} /> : null}
      {ids.length >= 2 && !ready && !failed ? <LoadingState label="Loading…" /> : null}
      {ids.length >= 2 && ready && list.length > 0 ? (
        <>
          <CautionNotice />
          <Section title="Side by side" hint="Each column is one cascade run; results first, then the settings it was launched with.">
            <NumbersTable label="Cascade runs side by side" testID="compare-cascades-table" heads={cascadeHeads(list)} rows={cascadeRows(list)} />
          </Section>
          <View style={styles.pyramids}>
            {list.map((c) => (
              <ChartCard key={c.detail.run.id} inGrid title={`${runName(c.detail.run)} · ${c.detail.cooler.name}`} hint="On one scale with the others: equal widths, equal couples." testID={`compare-pyramid-${c.detail.run.id}`}>
                {c.result ? <Pyramid stages={c.result.stages} scaleCouples={scale} sink={c.result.hotSide} compact testID={`pyramid-${c.detail.run.id}`} /> : <AppText tone="muted">No result.</AppText>}
              </ChartCard>
            ))}
          </View>
        </>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  pyramids: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
