import { useDeferredValue, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { formatNumber } from '@/components/format/number';
import { spacing } from '@/components/theme';
import { CautionNotice } from '@/components/screens/runs/caution-notice';
import type { RunResult } from '@/components/screens/runs/run-result';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { resultLegs, runLegCurves, type LegCurve } from './curve-model';
import { CurveInputs, defaultCurveText, parseCurveInputs, type CurveInputText } from './curve-inputs';
import { CurvePlots } from './curve-plots';
import { MarkedCurrentsTable, type MarkedRow } from './marked-currents-table';


const rowsOf = (legs: LegCurve[]): MarkedRow[] =>
  legs.flatMap((l) => (l.curve ? [{ key: l.key, label: l.label, maxHeatLoad: l.curve.maxHeatLoad, maxCop: l.curve.maxCop }] : []));

/** "Pumps heat from 1.2 A to 9.8 A" per leg, and how many samples are over the limit. */
function rangeLine(l: LegCurve): string {
  if (!l.curve) return `${l.label}: cannot hold this ΔT (${l.problem ?? 'no pumping range'}).`;
  const [lo, hi] = l.curve.pumpingRange;
  const over = l.curve.overLimit.filter(Boolean).length;
  const limit = l.curve.currentLimit;
  const flag = limit !== null && over > 0 ? ` — ${over} of ${l.curve.currents.length} sampled currents over the ${formatNumber(limit, 3)} A limit` : '';
  return `${l.label}: pumps heat from ${formatNumber(lo, 4)} A to ${formatNumber(hi, 4)} A${flag}.`;
}

/** Inputs, plots and the marked currents of a run's optimum and baselines. */
export function CurvesBody({ runCase, result }: { runCase: Record<string, unknown>; result: RunResult }) {
  const [text, setText] = useState<CurveInputText>(defaultCurveText);
  const parsed = parseCurveInputs(text, result.hotSide);
  const deltaT = useDeferredValue(parsed.deltaT);
  const limit = useDeferredValue(parsed.currentLimit);
  const legs = useMemo(
    () => (deltaT === null ? [] : runLegCurves(runCase, resultLegs(result), { hotSide: result.hotSide, deltaT, currentLimit: limit })),
    [runCase, result, deltaT, limit],
  );
  const rows = rowsOf(legs);
  const failed = legs.filter((l) => !l.curve);
  return (
    <View style={styles.wrap}>
      <Section title="Conditions" hint={`Heat sink at Th = ${formatNumber(result.hotSide, 4)} K, the run's own. The curves start where the leg begins to pump heat at this ΔT (or cold-side temperature).`}>
        <CurveInputs text={text} onChange={setText} parsed={parsed} hotSide={result.hotSide} />
      </Section>
      <CautionNotice testID="curves-caution" />
      {failed.length > 0 ? (
        <Notice tone="warning" title="Some legs cannot hold this ΔT" testID="curves-cannot-hold">
          {failed.map((l) => (
            <AppText key={l.key}>{rangeLine(l)}</AppText>
          ))}
        </Notice>
      ) : null}
      {rows.length > 0 ? (
        <>
          <Section title="Marked currents" hint="The current of maximum heat load and the current of maximum COP, per leg.">
            <MarkedCurrentsTable rows={rows} />
            {legs
              .filter((l) => l.curve)
              .map((l) => (
                <AppText key={l.key} variant="caption" tone="muted" testID={`pumping-range-${l.key}`}>
                  {rangeLine(l)}
                </AppText>
              ))}
          </Section>
          <CurvePlots legs={legs} deltaT={deltaT ?? 0} />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
});
