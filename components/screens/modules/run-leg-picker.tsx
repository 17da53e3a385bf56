import { StyleSheet, View } from 'react-native';
import type { RunSummary } from '@/shared/api/runs';
import { useDesigns } from '@/components/api/designs';
import { hasResult, useRuns } from '@/components/api/runs';
import { runChoiceLabel } from '@/components/screens/runs/run-format';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { ErrorLine } from '@/components/ui/field-parts';
import { AppText } from '@/components/ui/text';

/** How many recent runs of the right carrier the picker offers besides the one chosen. */
const offered = 8;

type Props = { side: 'p' | 'n'; runId: string; onPick: (runId: string) => void; error?: string; idPrefix?: string };

/**
 * A finished run whose family has this leg's carrier (or none, a constant
 * material), newest first: picked by design, objective and date, not by id.
 */
export function RunLegPicker({ side, runId, onPick, error, idPrefix = '' }: Props) {
  const id = `${idPrefix}${side}`;
  const runs = useRuns();
  const designs = useDesigns();
  const carrierOf = new Map((designs.data?.designs ?? []).map((d) => [d.id, d.carrier]));
  // Leg runs only: a couple or cascade run's legs come in whole from its cooler.
  const fits = (r: RunSummary) => r.kind === 'leg' && r.designId !== null && hasResult(r) && [side, null].includes(carrierOf.get(r.designId) ?? null);
  const all = runs.data?.runs ?? [];
  const chosen = all.find((r) => r.id === runId);
  const choices = [...(chosen ? [chosen] : []), ...all.filter((r) => r.id !== runId && fits(r)).slice(0, offered)];
  const loading = runs.isPending || designs.isPending;
  return (
    <View style={styles.wrap} testID={`${id}-run-picker`}>
      <AppText variant="label">{`Run (finished, ${side}-type family)`}</AppText>
      {loading ? <AppText tone="muted">Loading runs…</AppText> : null}
      {!loading && choices.length === 0 ? <AppText tone="muted">{`No finished ${side}-type runs yet: launch one from a design, or use a family at uniform doping.`}</AppText> : null}
      {!loading && runId !== '' && !chosen ? <AppText tone="danger">The chosen run is no longer in your team: pick another.</AppText> : null}
      <View style={styles.chips} role="radiogroup" aria-label={`Run for the ${side}-type leg`}>
        {choices.map((r) => (
          <Chip key={r.id} role="radio" label={runChoiceLabel(r)} selected={r.id === runId} onPress={() => onPick(r.id)} testID={`${id}-run-${r.id}`} />
        ))}
      </View>
      <ErrorLine message={error} testID={`${id}-run-error`} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
