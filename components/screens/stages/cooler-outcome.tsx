import type { CoolerRunDetail } from '@/shared/api/coolers';
import { CautionNotice } from '@/components/screens/runs/caution-notice';
import { formatDuration, secondsBetween } from '@/components/screens/runs/run-format';
import { FactList, type Fact } from '@/components/ui/fact-list';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { CascadeResultView } from './cascade-result-view';
import { parseCoolerResult, type CoolerSearch } from './cooler-result';
import { CoupleResultView } from './couple-result-view';

function computedFacts(detail: CoolerRunDetail, search: CoolerSearch | null, seconds: number, evaluations: number): Fact[] {
  const wall = secondsBetween(detail.run.startedAt, detail.run.finishedAt);
  const facts: Fact[] = [
    { key: 'engine', label: 'Engine version', value: detail.engineVersion },
    { key: 'time', label: 'Time taken', value: wall === null ? formatDuration(seconds) : `${formatDuration(wall)} from start to finish` },
    { key: 'evaluations', label: 'Evaluations', value: `${evaluations} in the winning start` },
  ];
  if (search) facts.push({ key: 'search', label: 'Search', value: `${search.startsDone} of ${search.starts} starts done; the best came from start ${search.bestStart + 1}` });
  if (detail.run.attempts > 1) facts.push({ key: 'attempts', label: 'Workers', value: `${detail.run.attempts} attempts: resumed from a checkpoint after a worker was lost` });
  return facts;
}

/** A finished couple or cascade run: what went wrong, or the result with its caution and how it was computed. */
export function CoolerOutcome({ detail }: { detail: CoolerRunDetail }) {
  const { run } = detail;
  const parsed = parseCoolerResult(run.kind, detail.result);
  return (
    <>
      {run.state === 'failed' ? (
        <Notice tone="danger" title="The run failed" testID="run-failed">
          <AppText>{run.error ?? 'The worker gave no reason.'}</AppText>
          <AppText tone="muted">Change the setup and launch a new run; this one keeps its record.</AppText>
        </Notice>
      ) : null}
      {run.state === 'cancelled' ? (
        <Notice tone="info" title="Cancelled" testID="run-cancelled">
          <AppText>{parsed ? 'The run was stopped on request. Below is the best result found before it stopped.' : 'The run was cancelled before a worker started it: there is no result.'}</AppText>
        </Notice>
      ) : null}
      {parsed && !parsed.ok ? (
        <Notice tone="danger" title="Result not readable">
          <AppText>{parsed.message}</AppText>
        </Notice>
      ) : null}
      {parsed?.ok ? (
        <>
          <Section title={run.state === 'cancelled' ? 'Best result before cancelling' : 'Result'} hint="What the model predicts for this setup at the optimum found.">
            <CautionNotice testID="cooler-caution" />
            {parsed.kind === 'cascade' ? <CascadeResultView result={parsed.result} runId={run.id} /> : <CoupleResultView result={parsed.result} runId={run.id} />}
          </Section>
          <Section title="How it was computed">
            <FactList facts={computedFacts(detail, parsed.search, parsed.result.seconds, parsed.result.evaluations)} label="How this result was computed" testID="cooler-run-facts" />
          </Section>
        </>
      ) : null}
    </>
  );
}
