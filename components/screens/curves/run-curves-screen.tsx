import { useLocalSearchParams } from 'expo-router';
import { ApiError } from '@/components/api/client';
import { isLegRunDetail, useRunDetail } from '@/components/api/runs';
import { runName, runTitle } from '@/components/screens/runs/run-format';
import { parseRunResult } from '@/components/screens/runs/run-result';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { Notice } from '@/components/ui/notice';
import { LinkButton } from '@/components/ui/link-button';
import { ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { CurvesBody } from './curves-body';

/** `/runs/[id]/curves`: operating curves of a finished run's leg and its baselines, computed in the browser. */
export function RunCurvesScreen() {
  const id = useLocalSearchParams<{ id: string }>().id ?? '';
  const query = useRunDetail(id);
  // Named once the run is in: "Run 12 · Detector p-leg", never a bare "Run".
  const back = { label: query.data ? runTitle(query.data.run) : 'The run', href: `/runs/${id}` } as const;
  if (!query.data) {
    const notFound = query.error instanceof ApiError && query.error.isNotFound;
    return (
      <ScreenFrame title="Operating curves" back={back}>
        {query.isError ? (
          <ErrorState title={notFound ? 'This run is not in your team' : 'Could not load the run'} message={query.error.message} />
        ) : (
          <LoadingState label="Loading the run…" />
        )}
      </ScreenFrame>
    );
  }
  const detail = query.data;
  // A couple's or cascade's run has no single leg to draw curves of: its page shows its own results.
  const parsed = isLegRunDetail(detail) ? parseRunResult(detail.result) : { ok: false as const, message: 'This run optimised a matched couple or a cascade: its results are on the run page.' };
  return (
    <ScreenFrame
      title={`Operating curves of ${runName(detail.run)}`}
      tabTitle={`${runName(detail.run)} operating curves`}
      subtitle={`${runTitle(detail.run)}: Qc, COP, voltage and power versus current`}
      back={back}
    >
      {parsed?.ok ? (
        <>
          <LinkButton variant="quiet" label="Build a module with this leg" href={`/modules/new?p=${detail.run.id}`} testID="curves-build-module" />
          <CurvesBody runCase={detail.case} result={parsed.result} />
        </>
      ) : (
        <Notice tone="info" title="No curves yet">
          <AppText>{parsed ? parsed.message : 'The run has no result yet: curves are drawn once it has finished.'}</AppText>
        </Notice>
      )}
    </ScreenFrame>
  );
}
