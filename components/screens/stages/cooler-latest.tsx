import type { RunSummary } from '@/shared/api/runs';
import { isCoolerRunDetail, useRunDetail } from '@/components/api/runs';
import { useRunProgress } from '@/components/realtime/use-run-progress';
import { runName } from '@/components/screens/runs/run-format';
import { LinkButton } from '@/components/ui/link-button';
import { LoadingState } from '@/components/ui/state-views';
import { CoolerLive } from './cooler-live';
import { CoolerOutcome } from './cooler-outcome';

/** The run going on now: its progress live, as on its own run page. */
export function CoolerActiveRun({ run }: { run: RunSummary }) {
  const query = useRunDetail(run.id);
  const live = useRunProgress(run.id, true);
  const detail = query.data;
  if (!detail || !isCoolerRunDetail(detail)) return <LoadingState label={`Loading ${runName(run)}…`} />;
  return <CoolerLive detail={detail} live={live} />;
}

/** The latest finished run's result (or why it has none), with a way to its own page. */
export function CoolerLatestResult({ run }: { run: RunSummary }) {
  const query = useRunDetail(run.id);
  const detail = query.data;
  if (!detail || !isCoolerRunDetail(detail)) return <LoadingState label={`Loading the result of ${runName(run)}…`} />;
  return (
    <>
      <LinkButton variant="quiet" label={`Open ${runName(run)}`} href={`/runs/${run.id}`} testID="latest-run-link" />
      <CoolerOutcome detail={detail} />
    </>
  );
}
