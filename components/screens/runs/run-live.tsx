import { StyleSheet, View } from 'react-native';
import type { RunDetail, RunProgress } from '@/shared/api/runs';
import { SeriesPlot } from '@/components/charts/series-plot';
import type { RunProgressState } from '@/components/realtime/use-run-progress';
import { useRole } from '@/components/auth/session';
import { formatDateTime } from '@/components/format/date';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { CancelRun } from './cancel-run';
import { ChartCard } from '@/components/charts/chart-card';
import { ConnectionLine } from './connection-line';
import { liveDopingSeries, mergeTrace, objectiveSeries } from './live-series';
import { ProgressBar } from './progress-bar';
import { progressWords } from './progress-words';
import { asObjective, formatDuration, formatObjective, objectiveInfo, placeInLine } from './run-format';

function caption(detail: RunDetail, p: RunProgress | null): string {
  const w = detail.run.waiting;
  if (detail.run.state === 'queued') return `Queued since ${formatDateTime(detail.run.createdAt)} · ${w ? placeInLine(w.position) : 'waiting for a free worker'}`;
  if (!p) return 'Starting: computing the baselines';
  return `${p.phase} · ${formatDuration(p.elapsedSeconds)} elapsed · ${p.evaluations} leg solves · the percentage is an estimate`;
}

function BestSoFar({ detail, p }: { detail: RunDetail; p: RunProgress | null }) {
  const objective = asObjective(detail.run.objective);
  const info = objectiveInfo[objective];
  if (!p) return null;
  const words = progressWords(objective, p);
  return (
    <View style={styles.best} testID="best-so-far">
      <AppText variant="caption" tone="muted">{`Best ${info.symbol} so far over all starts (model prediction)`}</AppText>
      <AppText variant="title">{formatObjective(objective, p.best)}</AppText>
      {words.bestAt ? <AppText variant="mono" tone="muted" testID="best-current">{words.bestAt}</AppText> : null}
      {words.start ? <AppText variant="caption" tone="muted" testID="start-progress">{words.start}</AppText> : null}
    </View>
  );
}

/** A queued or running run: progress bar, best so far, cancel, and the search drawn as it goes. */
export function RunLive({ detail, live }: { detail: RunDetail; live: RunProgressState }) {
  const { can } = useRole();
  const p = live.latest ?? detail.progress;
  const objective = asObjective(detail.run.objective);
  const info = objectiveInfo[objective];
  const trace = mergeTrace(detail.trace, live.live);
  const chart = objectiveSeries(trace);
  return (
    <>
      <Section title="Progress" hint="Everyone watching sees the same numbers; you can leave this page, the run goes on.">
        <ProgressBar fraction={p?.fractionDone ?? detail.run.fractionDone} label="Run progress" caption={caption(detail, p)} testID="run-progress" />
        {detail.run.waiting ? (
          <AppText variant="caption" tone="muted" testID="run-waiting">
            {detail.run.waiting.reason}
          </AppText>
        ) : null}
        <ConnectionLine state={live.connection} />
        <BestSoFar detail={detail} p={p} />
        {can('runs.launch') ? <CancelRun runId={detail.run.id} /> : null}
      </Section>
      <View style={styles.charts}>
        <ChartCard inGrid title={`${info.symbol} during the search`} hint="Against elapsed time: every start restarts the iteration count." testID="live-objective">
          {trace.length > 0 ? (
            <SeriesPlot
              series={chart.series}
              xLabel="Elapsed time (s)"
              yLabel={`${info.symbol}${info.unit ? ` (${info.unit})` : ' (dimensionless)'}`}
              description={`${info.symbol} of each reported point and best so far against elapsed time, ${trace.length} reports`}
              note={chart.hidden > 0 ? `${chart.hidden} tried ${chart.hidden === 1 ? 'point lies' : 'points lie'} far below the best (early steps of a random start) and ${chart.hidden === 1 ? 'is' : 'are'} not drawn.` : undefined}
            />
          ) : (
            <AppText tone="muted">The first report arrives once the worker has computed the baselines.</AppText>
          )}
        </ChartCard>
        <ChartCard inGrid title="Doping the optimiser holds now" hint="Best point of the start in progress; the run keeps the best start." testID="live-doping">
          <SeriesPlot
            series={liveDopingSeries(p, detail.design)}
            xLabel="Position from the cold end x (mm)"
            yLabel="n (cm⁻³), log scale"
            yScale="log"
            description="Current doping profile along the leg between the lowest and highest doping allowed"
          />
        </ChartCard>
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  best: { gap: spacing.xxs },
  charts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
