import { StyleSheet, View } from 'react-native';
import type { CoolerRunDetail } from '@/shared/api/coolers';
import { isFinished } from '@/components/api/runs';
import { formatDateTime } from '@/components/format/date';
import { useRunProgress } from '@/components/realtime/use-run-progress';
import { runName, runTitle, startsText } from '@/components/screens/runs/run-format';
import { RunStateBadge } from '@/components/screens/runs/run-state-badge';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { LinkButton } from '@/components/ui/link-button';
import { CoolerFacts } from './cooler-facts';
import { coolerGoal, coolerKindLabel } from './cooler-format';
import { CoolerLive } from './cooler-live';
import { CoolerOutcome } from './cooler-outcome';

const back = { label: 'Runs', href: '/runs' } as const;

/** `/runs/[id]` of a couple or cascade run: live while queued or running, then its result, and a way to its cooler. */
export function CoolerRunPage({ detail }: { detail: CoolerRunDetail }) {
  const { run, cooler } = detail;
  const active = !isFinished(run.state);
  const live = useRunProgress(run.id, active);
  return (
    <ScreenFrame
      title={runTitle(run)}
      tabTitle={runName(run)}
      subtitle={`${coolerKindLabel[cooler.kind]} · ${coolerGoal(cooler.input)} · ${startsText(run.starts)} · launched ${formatDateTime(run.createdAt)} by ${run.launchedBy}`}
      back={back}
    >
      <View style={styles.status}>
        <RunStateBadge state={run.state} size="large" testID="run-state" />
        <LinkButton variant="quiet" label={`${coolerKindLabel[cooler.kind]}: ${cooler.name}`} href={`/stages/${cooler.id}`} testID="run-cooler-link" />
      </View>
      {active ? <CoolerLive detail={detail} live={live} /> : <CoolerOutcome detail={detail} />}
      <Section title="What was run" hint="The setup as frozen when the run was launched.">
        <CoolerFacts cooler={cooler} testID="run-cooler-facts" />
      </Section>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  status: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
});
