import { StyleSheet, View } from 'react-native';
import { hasResult, useRuns } from '@/components/api/runs';
import { runChoiceLabel } from '@/components/screens/runs/run-format';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { ErrorLine } from '@/components/ui/field-parts';
import { AppText } from '@/components/ui/text';

/** How many recent matched-couple runs are offered besides the one chosen. */
const offered = 8;

type Props = { runId: string; onPick: (runId: string) => void; error?: string; testID: string };

/** A finished matched-couple run whose two legs (at its area ratio) make a stage's couples. */
export function CoupleRunPicker({ runId, onPick, error, testID }: Props) {
  const runs = useRuns();
  const all = runs.data?.runs ?? [];
  const chosen = all.find((r) => r.id === runId);
  const choices = [...(chosen ? [chosen] : []), ...all.filter((r) => r.id !== runId && r.kind === 'couple' && hasResult(r)).slice(0, offered)];
  return (
    <View style={styles.wrap} testID={testID}>
      <AppText variant="label">Matched-couple run (finished)</AppText>
      {runs.isPending ? <AppText tone="muted">Loading runs…</AppText> : null}
      {!runs.isPending && choices.length === 0 ? <AppText tone="muted">No finished matched-couple runs yet: build and launch a matched couple first, or use two legs.</AppText> : null}
      <View style={styles.chips} role="radiogroup" aria-label="Matched-couple run">
        {choices.map((r) => (
          <Chip key={r.id} role="radio" label={runChoiceLabel(r)} selected={r.id === runId} onPress={() => onPick(r.id)} testID={`${testID}-${r.id}`} />
        ))}
      </View>
      <ErrorLine message={error} testID={`${testID}-error`} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
