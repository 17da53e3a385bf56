import { StyleSheet, View } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import type { Cooler } from '@/shared/api/coolers';
import { ApiError } from '@/components/api/client';
import { useCooler, useLaunchCooler } from '@/components/api/coolers';
import { isFinished, useRuns } from '@/components/api/runs';
import { ReadOnlyNotice } from '@/components/auth/read-only-notice';
import { useRole } from '@/components/auth/session';
import { useLiveRuns } from '@/components/realtime/use-live-runs';
import { RunRow } from '@/components/screens/runs/run-row';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Section } from '@/components/ui/form-section';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { CoolerFacts } from './cooler-facts';
import { coolerGoal, coolerKindLabel } from './cooler-format';
import { CoolerActiveRun, CoolerLatestResult } from './cooler-latest';
import { DeleteCooler } from './delete-cooler';

const back = { label: 'Stages', href: '/stages' } as const;

function CoolerActions({ cooler }: { cooler: Cooler }) {
  const { can } = useRole();
  const launch = useLaunchCooler();
  return (
    <View style={styles.actions}>
      <View style={styles.buttons}>
        {can('runs.launch') ? <Button label={launch.isPending ? 'Launching…' : 'Launch run'} disabled={launch.isPending} onPress={() => launch.mutate(cooler.id)} /> : null}
        {can('designs.write') ? <LinkButton variant="quiet" label="Edit setup" href={`/stages/${cooler.id}/edit`} testID="edit-cooler" /> : null}
      </View>
      {launch.error ? (
        <Notice tone="danger" title="Run not launched">
          <AppText>{launch.error.message}</AppText>
        </Notice>
      ) : null}
    </View>
  );
}

function CoolerPage({ cooler }: { cooler: Cooler }) {
  const { can } = useRole();
  const runs = useRuns({ coolerId: cooler.id });
  const list = runs.data?.runs ?? [];
  const live = useLiveRuns(runs.data?.runs, true);
  const active = list.find((r) => !isFinished(r.state));
  const latestDone = list.find((r) => isFinished(r.state));
  return (
    <ScreenFrame title={cooler.name} subtitle={`${coolerKindLabel[cooler.kind]} · ${coolerGoal(cooler.input)}`} back={back}>
      {can('runs.launch') || can('designs.write') ? <CoolerActions cooler={cooler} /> : <ReadOnlyNotice what="Editing and launching cascades and couples" />}
      {active ? (
        <View style={styles.block} testID="cooler-active">
          <AppText variant="heading">{`Run ${active.number} ${active.state === 'queued' ? 'is queued' : 'is running'}`}</AppText>
          <CoolerActiveRun key={active.id} run={active} />
        </View>
      ) : null}
      {latestDone ? (
        <View style={styles.block} testID="cooler-latest">
          <AppText variant="heading">{`Latest finished run: Run ${latestDone.number}`}</AppText>
          <CoolerLatestResult key={latestDone.id} run={latestDone} />
        </View>
      ) : null}
      <Section title="Setup" hint="What a run of it computes; the legs and families are resolved when it is saved.">
        <CoolerFacts cooler={cooler} />
      </Section>
      <Section title="Runs" hint="Newest first.">
        {runs.isPending ? <LoadingState label="Loading runs…" /> : null}
        {runs.data && list.length === 0 ? <AppText tone="muted">{can('runs.launch') ? 'Not run yet: Launch run queues the first optimisation.' : 'Not run yet.'}</AppText> : null}
        {list.length > 0 ? (
          <View role="list" aria-label={`Runs of ${cooler.name}`}>
            {list.map((r) => (
              <View key={r.id} role="listitem">
                <RunRow run={r} live={live.progress[r.id]} />
              </View>
            ))}
          </View>
        ) : null}
      </Section>
      {runs.data ? <DeleteCooler cooler={cooler} finishedRuns={list.filter((r) => isFinished(r.state)).length} /> : null}
    </ScreenFrame>
  );
}

/** `/stages/[id]`: a cascade or matched couple, launch, the run in progress, the latest result and every run. */
export function CoolerScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useCooler(id);
  if (query.data) return <CoolerPage cooler={query.data.cooler} />;
  const notFound = query.error instanceof ApiError && query.error.isNotFound;
  return (
    <ScreenFrame title={notFound ? 'Not found' : 'Cooler'} back={back}>
      {query.isError ? <ErrorState title={notFound ? 'This cascade or couple is not in your team' : 'Could not load it'} message={query.error.message} onRetry={notFound ? undefined : () => void query.refetch()} /> : <LoadingState label="Loading…" />}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  actions: { gap: spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  block: { gap: spacing.md },
});
