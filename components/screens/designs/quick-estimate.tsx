import { useEffect, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Objective } from '@/shared/api/designs';
import { useFamilyDetail } from '@/components/api/families';
import { colors, radii, spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { ErrorLine } from '@/components/ui/field-parts';
import { AppText } from '@/components/ui/text';
import { doping, formatDuration, formatObjective, objectiveInfo, quantity } from '../runs/run-format';
import { humanize, requestBody, validateDesign, type DesignFormValues } from './design-form-model';
import { quickEstimate, type Estimate } from './quick-estimate-model';

type EstimateState =
  | { kind: 'idle' }
  | { kind: 'busy' }
  | { kind: 'done'; estimate: Estimate; key: string; objective: Objective }
  | { kind: 'error'; message: string };

export type QuickEstimateProps = {
  values: DesignFormValues;
  /** Called when the form has problems: the form then marks them. */
  onInvalid: () => void;
};

/** Lets the button's label and "Estimating…" paint before the engine takes the thread. */
const paintDelayMs = 20;

function EstimateNumbers({ estimate, objective }: { estimate: Estimate; objective: Objective }) {
  const { symbol } = objectiveInfo[objective];
  const u = estimate.uniform;
  const gain = estimate.twoNode.objective - u.objective;
  return (
    <View style={styles.numbers} testID="estimate-numbers">
      <AppText variant="label" tone="muted">
        Best uniform leg (estimate)
      </AppText>
      <AppText variant="heading" testID="estimate-uniform">
        {`${symbol} ≈ ${formatObjective(objective, u.objective, 3)} at ${quantity(u.current, 'A', 3)}`}
      </AppText>
      {u.perCm3 !== null ? <AppText variant="mono">{`uniform doping n ≈ ${doping(u.perCm3)}`}</AppText> : null}
      <AppText variant="mono" testID="estimate-two-node">
        {`two-node graded leg ≈ ${formatObjective(objective, estimate.twoNode.objective, 3)} (${gain >= 0 ? '+' : ''}${formatObjective(objective, gain, 2)})`}
      </AppText>
    </View>
  );
}

/**
 * "Quick estimate": the uniform leg (and a two-node grading) solved in the
 * browser with the engine, in well under a second, before anything is queued.
 */
export function QuickEstimate({ values, onInvalid }: QuickEstimateProps) {
  const [state, setState] = useState<EstimateState>({ kind: 'idle' });
  const family = useFamilyDetail(values.familyId, values.familyVersion);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const key = JSON.stringify(requestBody(values));
  const material = family.data?.current.definition;
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
    },
    [],
  );

  const run = () => {
    // The name does not change the physics: an unnamed draft can be estimated.
    const checked = validateDesign({ ...values, name: values.name.trim() || 'Unnamed draft' });
    if (!checked.ok) {
      onInvalid();
      setState({ kind: 'error', message: 'Fix the fields marked in the form first.' });
      return;
    }
    if (!material) return;
    setState({ kind: 'busy' });
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => {
      const outcome = quickEstimate(checked.input, material);
      if (outcome.ok) setState({ kind: 'done', estimate: outcome.estimate, key, objective: checked.input.objective });
      else setState({ kind: 'error', message: humanize(fieldOf(outcome.field), `${fieldOf(outcome.field)}: ${outcome.message}`) });
    }, paintDelayMs);
  };

  const stale = state.kind === 'done' && state.key !== key;
  return (
    <View style={styles.box} testID="quick-estimate">
      <View style={styles.head}>
        <View style={styles.headText}>
          <AppText variant="bodyStrong">Quick estimate</AppText>
          <AppText variant="caption" tone="muted">
            The best uniform leg, solved here in the browser with the same engine; nothing is queued or saved.
          </AppText>
        </View>
        <Button
          label={state.kind === 'busy' ? 'Estimating…' : state.kind === 'done' ? 'Estimate again' : 'Quick estimate'}
          variant="quiet"
          onPress={run}
          disabled={state.kind === 'busy' || !material}
        />
      </View>
      {state.kind === 'done' ? <EstimateNumbers estimate={state.estimate} objective={state.objective} /> : null}
      {state.kind === 'done' ? (
        <AppText variant="caption" tone={stale ? 'heat' : 'muted'}>
          {stale
            ? 'The values changed since this estimate: estimate again.'
            : `Computed in ${formatDuration(state.estimate.seconds)}. The run grades ${values.numbers.controlPoints || 'the default number of'} control points from ${values.numbers.starts || 'the default number of'} starts and usually does better.`}
        </AppText>
      ) : null}
      {state.kind === 'error' ? <ErrorLine message={state.message} /> : null}
    </View>
  );
}

/** Engine fields back to the form's names (`bounds.minPerCm3` → `minPerCm3`). */
function fieldOf(engineField: string): string {
  const map: Record<string, string> = { length: 'lengthMm', area: 'areaMm2', 'bounds.minPerCm3': 'minPerCm3', 'bounds.maxPerCm3': 'maxPerCm3', bounds: 'maxPerCm3' };
  return map[engineField] ?? engineField;
}

const styles = StyleSheet.create({
  box: {
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.primary,
    backgroundColor: colors.primarySoft,
    padding: spacing.lg,
    gap: spacing.sm,
  },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
  headText: { flex: 1, minWidth: 220, gap: spacing.xxs },
  numbers: { gap: spacing.xxs },
});
