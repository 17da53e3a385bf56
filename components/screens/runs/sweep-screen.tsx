import { View } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import type { Sweep } from '@/shared/api/runs';
import { hasResult, isFinished, isLegRunDetail, useRunDetails, useSweep } from '@/components/api/runs';
import { SeriesPlot } from '@/components/charts/series-plot';
import { formatDateTime } from '@/components/format/date';
import { useLiveRuns } from '@/components/realtime/use-live-runs';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { Section } from '@/components/ui/form-section';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { ChartCard } from '@/components/charts/chart-card';
import { ConnectionLine } from './connection-line';
import { ProgressBar } from './progress-bar';
import { asObjective, formatSweepValue, objectiveInfo, sweepParameterInfo } from './run-format';
import { RunRow } from './run-row';
import { optimumSeries, sweepFraction, uniformSeries } from './sweep-model';

function SweepPage({ sweep }: { sweep: Sweep }) {
  const live = useLiveRuns(sweep.runs, true);
  const finishedIds = sweep.runs.filter(hasResult).map((r) => r.id);
  const details = useRunDetails(finishedIds).flatMap((q) => (q.data && isLegRunDetail(q.data) ? [q.data] : []));
  const param = sweepParameterInfo[sweep.parameter];
  const objective = asObjective(sweep.runs[0]?.objective ?? 'maxDeltaT');
  const info = objectiveInfo[objective];
  const done = sweep.runs.filter((r) => isFinished(r.state)).length;
  const series = [optimumSeries(sweep.runs), uniformSeries(sweep.runs, details)].filter((s) => s.line.length > 0);
  const designName = sweep.runs[0]?.designName ?? 'design';
  return (
    <ScreenFrame
      title={`Sweep of ${param.label.toLowerCase()}`}
      subtitle={`${designName} · ${sweep.values.length} values · launched ${formatDateTime(sweep.createdAt)}`}
      back={{ label: designName, href: `/designs/${sweep.designId}` }}
    >
      <Section title="Progress" hint="Each value is its own run; free workers take them in parallel.">
        <ProgressBar fraction={sweepFraction(sweep.runs, live.progress)} label="Sweep progress" caption={`${done} of ${sweep.runs.length} runs finished · estimate`} testID="sweep-progress" />
        {done < sweep.runs.length || live.connection === 'offline' ? <ConnectionLine state={live.connection} /> : null}
      </Section>
      <ChartCard title={`${info.symbol} against ${param.label.toLowerCase()}`} hint="Points appear as runs finish. Model predictions." testID="sweep-plot">
        {series.length > 0 ? (
          <SeriesPlot
            series={series}
            xLabel={`${param.label} ${param.symbol} (${param.unit})${param.scale === 'log' ? ', log scale' : ''}`}
            yLabel={`${info.symbol}${info.unit ? ` (${info.unit})` : ' (dimensionless)'}`}
            xScale={param.scale}
            description={`${info.symbol} of the graded optimum and the best uniform leg against ${param.label.toLowerCase()}`}
          />
        ) : (
          <AppText tone="muted">No run has finished yet.</AppText>
        )}
      </ChartCard>
      <Section title="Runs" hint="One per value, in order of the value.">
        <View role="list" aria-label="Runs of the sweep">
          {sweep.runs.map((r) => (
            <View key={r.id} role="listitem">
              <RunRow run={r} live={live.progress[r.id]} sweepLabel={r.sweepValue === null ? undefined : `${param.symbol} = ${formatSweepValue(sweep.parameter, r.sweepValue)}`} />
            </View>
          ))}
        </View>
      </Section>
    </ScreenFrame>
  );
}

/** `/sweeps/[id]`: runs per value, filling in live, and the optimum plotted against the parameter. */
export function SweepScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useSweep(id);
  if (query.data) return <SweepPage sweep={query.data.sweep} />;
  return (
    <ScreenFrame title="Sweep" back={{ label: 'Runs', href: '/runs' }}>
      {query.isError ? (
        <ErrorState title="Could not load the sweep" message={query.error.message} onRetry={() => void query.refetch()} retrying={query.isFetching} />
      ) : (
        <LoadingState label="Loading the sweep…" />
      )}
    </ScreenFrame>
  );
}

