import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { GrowthState } from '@/shared/api/growth';
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

export type AdvanceOrderProps = { orderId: string; state: GrowthState; measured: boolean };

/** The grower's one step forward, with an optional note for the timeline. */
export function AdvanceOrder({ orderId, state, measured }: AdvanceOrderProps) {
  const { can } = useRole();
  const advance = useAdvanceOrder(orderId);
  const [note, setNote] = useState('');
  const next = nextState(state);
  if (!can('growth.update') || next === null) return null;
  const go = () => advance.mutate({ state: next, note: note.trim() }, { onSuccess: () => setNote('') });
  return (
    <Section title="Next step" hint={`From ${growthStateLook[state].label.toLowerCase()} to ${growthStateLook[next].label.toLowerCase()}: ${growthStateLook[next].meaning}.`} testID="advance-order">
      {next === 'measured' && !measured ? (
        <Notice tone="info" title="No measurements yet">
          <AppText>Upload the as-grown measurements below first, so the physicist sees the predicted ΔT and the zone checks.</AppText>
        </Notice>
      ) : null}
      <TextField id="state-note" label="Note for the timeline" help="Optional: furnace run, boule id, anything the team should know." value={note} onChangeText={setNote} multiline />
      <View style={styles.buttons}>
        <Button label={advance.isPending ? 'Saving…' : advanceLabel[next]} onPress={go} disabled={advance.isPending} />
      </View>
      {advance.error ? <ErrorNotice title="The order did not move" error={advance.error} /> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
