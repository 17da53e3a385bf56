import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { RunSummary } from '@/shared/api/runs';
import { hasResult, isFinished, useRuns } from '@/components/api/runs';
import { useLiveRuns } from '@/components/realtime/use-live-runs';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { LinkButton } from '@/components/ui/link-button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { StagesEntry } from '@/components/screens/stages/stages-entry';
import { ConnectionLine } from './connection-line';
import { CompareBar, useCompareSelection } from './compare-bar';
import { compareHref, maxCompared } from './compare-model';
import { RunRow } from './run-row';

type Filter = 'all' | 'active' | 'finished';
const filters: Array<{ key: Filter; label: string }> = [
  { key: 'all', label: 'All' },
  { key: 'active', label: 'Queued or running' },
  { key: 'finished', label: 'Finished' },
];

const keep = (filter: Filter) => (r: RunSummary) => filter === 'all' || (filter === 'active') !== isFinished(r.state);
/** Recent runs of the team, live; pick several to compare. */
export function RunsScreen() {
  const query = useRuns();
  const [filter, setFilter] = useState<Filter>('all');
  const { selected, toggle, clear } = useCompareSelection();
  const runs = query.data?.runs;
  const live = useLiveRuns(runs, true);
  const shown = (runs ?? []).filter(keep(filter));
  const anyActive = (runs ?? []).some((r) => !isFinished(r.state));
  return (
    <ScreenFrame
      title="Runs"
      subtitle="Optimisation runs of your team, newest first"
      accessory={<LinkButton variant="quiet" label="Modules" href="/modules" testID="modules-link" />}
      refreshing={query.isRefetching} onRefresh={() => void query.refetch()}>
      <StagesEntry />
      <View style={styles.toolbar}>
        <View style={styles.filters} role="tablist" aria-label="Which runs">
          {filters.map((f) => (
            <Chip key={f.key} role="tab" label={f.label} selected={filter === f.key} onPress={() => setFilter(f.key)} />
          ))}
        </View>
        {anyActive || live.connection === 'offline' ? <ConnectionLine state={live.connection} /> : null}
      </View>
      <CompareBar
        count={selected.length}
        hint={`Tick up to ${maxCompared} finished runs to compare them side by side.`}
        link={selected.length >= 2 ? { label: `Compare ${selected.length} runs`, href: compareHref(selected, []), testID: 'compare-link' } : null}
        onClear={clear}
        testID="compare-bar"
      />
      {query.isPending ? <LoadingState label="Loading runs…" /> : null}
      {query.isError ? <ErrorState title="Could not load runs" message={query.error.message} onRetry={() => void query.refetch()} retrying={query.isFetching} /> : null}
      {runs && shown.length === 0 ? (
        <EmptyState title="No runs here" body="Runs are launched from a design's page: open Designs, pick one and launch a run or a sweep." />
      ) : null}
      {shown.length > 0 ? (
        <View role="list" aria-label="Runs" style={styles.list}>
          {shown.map((r) => (
            <View key={r.id} role="listitem">
              <RunRow
                run={r}
                live={live.progress[r.id]}
                showDesign
                sweepLabel={r.sweepId ? 'Part of a sweep' : undefined}
                selection={r.kind === 'leg' && hasResult(r) ? { selected: selected.includes(r.id), onToggle: () => toggle(r.id) } : undefined}
              />
            </View>
          ))}
        </View>
      ) : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  toolbar: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: spacing.md },
  filters: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  list: { gap: spacing.xxs },
});
