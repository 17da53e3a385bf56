import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { GrowthState } from '@/shared/api/growth';
import { ApiError } from '@/components/api/client';
import { useCloseOrder, type CloseVariables } from '@/components/api/growth';
import { useRole } from '@/components/auth/session';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ErrorNotice } from './error-notice';
import { isClosed } from './growth-state';

type Verdict = CloseVariables['verdict'];

/** The physicist's verdict on an open order: approve (once measured) or reject, always with a reason. */
export function CloseOrder({ orderId, state }: { orderId: string; state: GrowthState }) {
  const { can } = useRole();
  const close = useCloseOrder(orderId);
  const measured = state === 'measured';
  const [verdict, setVerdict] = useState<Verdict>(measured ? 'approved' : 'rejected');
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  if (!can('profiles.release') || isClosed(state)) return null;
  const chosen: Verdict = verdict === 'approved' && !measured ? 'rejected' : verdict;
  const serverReason = close.error instanceof ApiError ? close.error.fieldErrors.find((e) => e.field === 'reason')?.message : undefined;
  const submit = () => {
    if (reason.trim() === '') {
      setMissing(true);
      return;
    }
    close.mutate({ verdict: chosen, reason: reason.trim() });
  };
  return (
    <Section title="Close the order" hint="Closing ends the grower's steps; the verdict and reason go on the timeline." testID="close-order">
      <View style={styles.row} role="radiogroup" aria-label="Verdict">
        <Chip role="radio" label="Approve" selected={chosen === 'approved'} onPress={() => setVerdict('approved')} disabled={!measured} testID="verdict-approved" />
        <Chip role="radio" label="Reject" selected={chosen === 'rejected'} onPress={() => setVerdict('rejected')} testID="verdict-rejected" />
      </View>
      {measured ? null : (
        <AppText variant="caption" tone="muted">
          Approving needs the grown piece measured; an order can be rejected at any step.
        </AppText>
      )}
      <TextField
        id="close-reason"
        label="Reason"
        required
        multiline
        value={reason}
        onChangeText={(t) => {
          setReason(t);
          setMissing(false);
        }}
        error={missing ? 'Give a reason: it is what the grower reads.' : serverReason}
      />
      <Button label={close.isPending ? 'Closing…' : chosen === 'approved' ? 'Close as approved' : 'Close as rejected'} onPress={submit} disabled={close.isPending} />
      {close.error && !serverReason ? <ErrorNotice title="Not closed" error={close.error} /> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
