import type { RunDetail } from '@/shared/api/runs';
import { legEndsOfCase } from '@/shared/engine/leg-ends';
import { legEndsWords } from '@/components/format/leg-ends-words';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { BipolarNotice, type BandCount } from './bipolar-note';
import { CautionNotice } from './caution-notice';
import { Gains, HeadlineNumbers } from './headline-numbers';
import { LegPlots } from './leg-plots';
import { ProfileTable } from './profile-table';
import { asObjective } from './run-format';
import { RunFacts } from './run-facts';
import { parseRunResult } from './run-result';

/** What the run's (frozen) family can say about bipolar conduction. */
function bandsOf(runCase: RunDetail['case']): BandCount {
  const material = runCase.material as { kind?: string; minority?: unknown } | undefined;
  if (material?.kind !== 'band') return 'not a band model';
  return material.minority === undefined ? 'one band' : 'two bands';
}

/** A finished run: what went wrong, or the converged leg with its baselines, plots, table and provenance. */
export function RunOutcome({ detail }: { detail: RunDetail }) {
  const { run } = detail;
  const parsed = parseRunResult(detail.result);
  const objective = asObjective(run.objective);
  return (
    <>
      {run.state === 'failed' ? (
        <Notice tone="danger" title="The run failed" testID="run-failed">
          <AppText>{run.error ?? 'The worker gave no reason.'}</AppText>
          <AppText tone="muted">Fix the design (or the family) and launch a new run; this one keeps its record.</AppText>
        </Notice>
      ) : null}
      {run.state === 'cancelled' ? (
        <Notice tone="info" title="Cancelled" testID="run-cancelled">
          <AppText>
            {parsed ? 'The run was stopped on request. Below is the best result found before it stopped; the search was not finished.' : 'The run was cancelled before a worker started it: there is no result.'}
          </AppText>
        </Notice>
      ) : null}
      {parsed && !parsed.ok ? (
        <Notice tone="danger" title="Result not readable">
          <AppText>{parsed.message}</AppText>
        </Notice>
      ) : null}
      {parsed?.ok ? (
        <>
          <Section title={run.state === 'cancelled' ? 'Best result before cancelling' : 'Result'} hint="The converged leg as the model predicts it.">
            <CautionNotice />
            <BipolarNotice bipolar={run.bipolar} bands={bandsOf(detail.case)} />
            <HeadlineNumbers result={parsed.result} objective={objective} />
            <AppText variant="caption" tone="muted" testID="run-computed-with">
              {`Computed with ${legEndsWords(legEndsOfCase(detail.case))}; the baselines below too.`}
            </AppText>
          </Section>
          <Section title="Gain over the baselines" hint="The same leg and conditions with a uniform doping, and with the doping that maximises zT at each point.">
            <Gains result={parsed.result} objective={objective} />
          </Section>
          <LegPlots result={parsed.result} runCase={detail.case} lengthMm={detail.design.lengthMm} />
          <Section title="Profile along the leg" hint="From the cold end (x = 0) to the heat sink.">
            <ProfileTable profile={parsed.result.profile} />
          </Section>
          <Section title="How it was computed">
            <RunFacts detail={detail} result={parsed.result} />
          </Section>
        </>
      ) : null}
    </>
  );
}
