import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDto, GrowthState } from '@/shared/api/growth';
import { stepBlocker } from '@/shared/growth/order-steps';
import { useAdvanceOrder } from '@/components/api/growth';
import { useRole } from '@/components/auth/session';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ErrorNotice } from './error-notice';
import { advanceLabel, growthStateLook, nextState } from './growth-state';

export type AdvanceOrderProps = { orderId: string; state: GrowthState; sheetStatus: GrowthOrderDto['sheetStatus']; measured: boolean };

/**
 * The grower's one step forward, with an optional note for the timeline.
 * No step can be undone, so its button stays disabled, with the reason, until
 * what the step needs is there (the API refuses it on the same rule).
 */
export function AdvanceOrder({ orderId, state, sheetStatus, measured }: AdvanceOrderProps) {
  const { can } = useRole();
  const advance = useAdvanceOrder(orderId);
  const [note, setNote] = useState('');
  const next = nextState(state);
  if (!can('growth.update') || next === null) return null;
  const blocker = stepBlocker(next, { sheetStatus, uploads: measured ? 1 : 0 });
  const go = () => advance.mutate({ state: next, note: note.trim() }, { onSuccess: () => setNote('') });
  return (
    <Section title="Next step" hint={`From ${growthStateLook[state].label.toLowerCase()} to ${growthStateLook[next].label.toLowerCase()}: ${growthStateLook[next].meaning}.`} testID="advance-order">
      {blocker ? (
        <Notice tone="info" title={blocker.field === 'measurements' ? 'No measurements yet' : 'Growth sheet not ready'} testID="advance-blocker">
          <AppText>
            {blocker.field === 'measurements'
              ? `“${advanceLabel[next]}” opens once the as-grown measurements are uploaded below, so the physicist sees the predicted ΔT and the zone checks.`
              : `“${advanceLabel[next]}” opens once the growth sheet is ready: ${blocker.message}.`}
          </AppText>
        </Notice>
      ) : null}
      <TextField id="state-note" label="Note for the timeline" help="Optional: furnace run, boule id, anything the team should know." value={note} onChangeText={setNote} multiline />
      <View style={styles.buttons}>
        <Button label={advance.isPending ? 'Saving…' : advanceLabel[next]} onPress={go} disabled={advance.isPending || blocker !== null} />
      </View>
      {advance.error ? <ErrorNotice title="The order did not move" error={advance.error} /> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
