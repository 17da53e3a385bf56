import { StyleSheet, View } from 'react-native';
import type { CoolerRunDetail } from '@/shared/api/coolers';
import { useRole } from '@/components/auth/session';
import { ChartCard } from '@/components/charts/chart-card';
import { SeriesPlot } from '@/components/charts/series-plot';
import { formatDateTime } from '@/components/format/date';
import type { RunProgressState } from '@/components/realtime/use-run-progress';
import { CancelRun } from '@/components/screens/runs/cancel-run';
import { ConnectionLine } from '@/components/screens/runs/connection-line';
import { mergeTrace, objectiveSeries } from '@/components/screens/runs/live-series';
import { ProgressBar } from '@/components/screens/runs/progress-bar';
import { formatDuration, placeInLine } from '@/components/screens/runs/run-format';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { coolerBestWords } from './cooler-format';

function caption(detail: CoolerRunDetail, live: RunProgressState): string {
  const p = live.latest ?? detail.progress;
  const w = detail.run.waiting;
  if (detail.run.state === 'queued') return `Queued since ${formatDateTime(detail.run.createdAt)} · ${w ? placeInLine(w.position) : 'waiting for a free worker'}`;
  if (!p) return 'Starting';
  return `${p.phase} · ${formatDuration(p.elapsedSeconds)} elapsed · ${p.evaluations} evaluations · the percentage is an estimate`;
}

/** A queued or running couple or cascade run: progress, best so far, cancel, and the search drawn as it goes. */
export function CoolerLive({ detail, live }: { detail: CoolerRunDetail; live: RunProgressState }) {
  const { can } = useRole();
  const p = live.latest ?? detail.progress;
  const trace = mergeTrace(detail.trace, live.live);
  const chart = objectiveSeries(trace);
  const objective = detail.run.objective;
  return (
    <>
      <Section title="Progress" hint="You can leave this page; the run goes on and everyone watching sees the same numbers.">
        <ProgressBar fraction={p?.fractionDone ?? detail.run.fractionDone} label="Run progress" caption={caption(detail, live)} testID="run-progress" />
        {detail.run.waiting ? (
          <AppText variant="caption" tone="muted" testID="run-waiting">
            {detail.run.waiting.reason}
          </AppText>
        ) : null}
        <ConnectionLine state={live.connection} />
        {p ? (
          <View style={styles.best} testID="best-so-far">
            <AppText variant="caption" tone="muted">Over all starts so far (model prediction)</AppText>
            <AppText variant="heading">{coolerBestWords(objective, p.best, false)}</AppText>
            {p.start && p.start.of > 1 ? <AppText variant="caption" tone="muted">{`Start ${p.start.number} of ${p.start.of}`}</AppText> : null}
          </View>
        ) : null}
        {can('runs.launch') ? <CancelRun runId={detail.run.id} /> : null}
      </Section>
      <ChartCard title="The objective during the search" hint="Against elapsed time; each start begins afresh." testID="live-objective">
        {trace.length > 0 ? (
          <SeriesPlot series={chart.series} xLabel="Elapsed time (s)" yLabel={objective === 'minPower' ? 'P (W)' : objective === 'maxCop' ? 'COP (dimensionless)' : objective === 'maxHeatLoad' ? 'Qc (W)' : 'ΔT (K)'} description={`Objective of each report and the best so far against elapsed time, ${trace.length} reports`} />
        ) : (
          <AppText tone="muted">The first report arrives once the worker has begun the first start.</AppText>
        )}
      </ChartCard>
    </>
  );
}

const styles = StyleSheet.create({
  best: { gap: spacing.xxs },
});
