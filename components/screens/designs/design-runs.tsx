import { StyleSheet, View } from 'react-native';
import type { RunSummary } from '@/shared/api/runs';
import { useRuns } from '@/components/api/runs';
import { useLiveRuns } from '@/components/realtime/use-live-runs';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { LinkButton } from '@/components/ui/link-button';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { RunRow } from '../runs/run-row';

/** Sweeps of the design, each once, newest first (runs come newest first). */
function sweepsOf(runs: RunSummary[]): Array<{ id: string; count: number }> {
  const counts = new Map<string, number>();
  for (const r of runs) if (r.sweepId) counts.set(r.sweepId, (counts.get(r.sweepId) ?? 0) + 1);
  return [...counts].map(([id, count]) => ({ id, count }));
}

/** The design's runs (single runs listed, sweeps linked), live while any is going. */
export function DesignRuns({ designId }: { designId: string }) {
  const query = useRuns({ designId });
  const runs = query.data?.runs;
  const live = useLiveRuns(runs, true);
  const single = (runs ?? []).filter((r) => r.sweepId === null);
  const sweeps = sweepsOf(runs ?? []);
  return (
    <Section title="Runs of this design" hint="Newest first; each run froze the design as it was when launched.">
      {query.isPending ? <LoadingState label="Loading runs…" /> : null}
      {query.isError ? <ErrorState title="Could not load runs" message={query.error.message} onRetry={() => void query.refetch()} /> : null}
      {runs && runs.length === 0 ? <AppText tone="muted">No runs yet.</AppText> : null}
      {sweeps.length > 0 ? (
        <View style={styles.sweeps}>
          {sweeps.map((s, i) => (
            <LinkButton key={s.id} variant="quiet" href={`/sweeps/${s.id}`} label={`Sweep ${sweeps.length - i} · ${s.count} runs`} />
          ))}
        </View>
      ) : null}
      {single.length > 0 ? (
        <View role="list" aria-label="Runs">
          {single.map((r) => (
            <View key={r.id} role="listitem">
              <RunRow run={r} live={live.progress[r.id]} />
            </View>
          ))}
        </View>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  sweeps: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
