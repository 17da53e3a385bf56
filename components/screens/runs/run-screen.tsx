import { StyleSheet, View } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import type { RunDetail } from '@/shared/api/runs';
import { ApiError } from '@/components/api/client';
import { isFinished, isLegRunDetail, useRunDetail } from '@/components/api/runs';
import { formatDateTime } from '@/components/format/date';
import { useRunProgress } from '@/components/realtime/use-run-progress';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { LinkButton } from '@/components/ui/link-button';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { DesignFacts } from '../designs/design-facts';
import { CoolerRunPage } from '../stages/cooler-run-page';
import { ReleaseButton } from '../growth/release-button';
import { objectiveInfo, runName, runTitle, startsText, sweepNote } from './run-format';
import { RunLive } from './run-live';
import { RunOutcome } from './run-outcome';
import { RunStateBadge } from './run-state-badge';

const back = { label: 'Runs', href: '/runs' } as const;

function RunPage({ detail }: { detail: RunDetail }) {
  const { run, design } = detail;
  const active = !isFinished(run.state);
  const live = useRunProgress(run.id, active);
  const sweep = sweepNote(detail);
  return (
    <ScreenFrame
      title={runTitle(run)}
      tabTitle={runName(run)}
      subtitle={`${objectiveInfo[design.objective].goal} · ${startsText(run.starts)} · launched ${formatDateTime(run.createdAt)} by ${run.launchedBy}`}
      back={back}
    >
      <View style={styles.status}>
        <RunStateBadge state={run.state} size="large" testID="run-state" />
        <View style={styles.links}>
          <LinkButton variant="quiet" label="Design" href={`/designs/${run.designId}`} />
          {run.state === 'succeeded' ? <LinkButton variant="quiet" label="Operating curves" href={`/runs/${run.id}/curves`} testID="run-curves-link" /> : null}
          {run.sweepId ? <LinkButton variant="quiet" label={sweep ?? 'Sweep'} href={`/sweeps/${run.sweepId}`} /> : null}
        </View>
      </View>
      {run.state === 'succeeded' ? <ReleaseButton runId={run.id} /> : null}
      {active ? <RunLive detail={detail} live={live} /> : <RunOutcome detail={detail} />}
      <Section title="What was run" hint="The design and family version as frozen when the run was launched.">
        <DesignFacts design={design} testID="run-design" />
      </Section>
    </ScreenFrame>
  );
}

/** `/runs/[id]`: live while queued or running, the result once finished; any kind of run. */
export function RunScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useRunDetail(id);
  // A couple's or cascade's run has a cooler, not a design: its own page.
  if (query.data) return isLegRunDetail(query.data) ? <RunPage detail={query.data} /> : <CoolerRunPage detail={query.data} />;
  const notFound = query.error instanceof ApiError && query.error.isNotFound;
  return (
    <ScreenFrame title={notFound ? 'No such run' : 'Run'} back={back}>
      {query.isError ? (
        <ErrorState
          title={notFound ? 'This run is not in your team' : 'Could not load the run'}
          message={query.error.message}
          onRetry={notFound ? undefined : () => void query.refetch()}
          retrying={query.isFetching}
        />
      ) : (
        <LoadingState label="Loading the run…" />
      )}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  status: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
  links: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
