import { StyleSheet, View } from 'react-native';
import type { RunSummary } from '@/shared/api/runs';
import { useRuns } from '@/components/api/runs';
import { formatDateTime } from '@/components/format/date';
import { useLiveRuns } from '@/components/realtime/use-live-runs';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { LinkButton } from '@/components/ui/link-button';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { RunRow } from '../runs/run-row';

/** Sweeps of the design, each once, newest first (runs come newest first). */
function sweepsOf(runs: RunSummary[]): Array<{ id: string; count: number; at: string }> {
  const sweeps = new Map<string, { count: number; at: string }>();
  for (const r of runs) {
    if (!r.sweepId) continue;
    const s = sweeps.get(r.sweepId);
    sweeps.set(r.sweepId, { count: (s?.count ?? 0) + 1, at: s?.at ?? r.createdAt });
  }
  return [...sweeps].map(([id, s]) => ({ id, ...s }));
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
            <LinkButton key={s.id} variant="quiet" href={`/sweeps/${s.id}`} label={`Sweep ${sweeps.length - i} · ${s.count} runs · ${formatDateTime(s.at)}`} />
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
