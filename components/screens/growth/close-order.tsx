import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { GrowthState } from '@/shared/api/growth';
import { ApiError } from '@/components/api/client';
import { useCloseOrder, type CloseVariables } from '@/components/api/growth';
import { useRole } from '@/components/auth/session';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { ConfirmBox } from '@/components/ui/confirm-box';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ErrorNotice } from './error-notice';
import { isClosed } from './growth-state';

type Verdict = CloseVariables['verdict'];

/** What each verdict's reason field asks for: the grower is e-mailed it. */
const reasonLabel: Record<Verdict, string> = {
  approved: 'Reason for approving (e-mailed to the grower)',
  rejected: 'Reason for rejecting (e-mailed to the grower)',
};

/**
 * The physicist's verdict on an open order: approve (once measured) or
 * reject, always with a reason. Closing cannot be undone, so nothing is
 * chosen for the physicist: the main button names the verdict only once one
 * is picked, and asks once more before it closes the order.
 */
export function CloseOrder({ orderId, state }: { orderId: string; state: GrowthState }) {
  const { can } = useRole();
  const close = useCloseOrder(orderId);
  const measured = state === 'measured';
  const [picked, setPicked] = useState<Verdict | null>(null);
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  if (!can('profiles.release') || isClosed(state)) return null;
  // An approval picked while measured stays unchosen if the order is no longer measured.
  const verdict: Verdict | null = picked === 'approved' && !measured ? null : picked;
  const serverReason = close.error instanceof ApiError ? close.error.fieldErrors.find((e) => e.field === 'reason')?.message : undefined;
  const pick = (v: Verdict) => {
    setPicked(v);
    setConfirming(false);
  };
  const ask = () => {
    if (reason.trim() === '') {
      setMissing(true);
      return;
    }
    setConfirming(true);
  };
  const word = verdict === 'approved' ? 'approved' : 'rejected';
  return (
    <Section title="Close the order" hint="Closing ends the grower's steps for good; the verdict and reason go on the timeline and are e-mailed to the team's growers." testID="close-order">
      <View style={styles.row} role="radiogroup" aria-label="Verdict">
        <Chip role="radio" label="Approve" selected={verdict === 'approved'} onPress={() => pick('approved')} disabled={!measured} testID="verdict-approved" />
        <Chip role="radio" label="Reject" selected={verdict === 'rejected'} onPress={() => pick('rejected')} testID="verdict-rejected" />
      </View>
      {measured ? null : (
        <AppText variant="caption" tone="muted">
          Approving needs the grown piece measured; an order can be rejected at any step.
        </AppText>
      )}
      {verdict === null ? (
        <AppText tone="muted" testID="close-choose">
          Choose Approve or Reject first.
        </AppText>
      ) : (
        <TextField
          id="close-reason"
          label={reasonLabel[verdict]}
          required
          multiline
          value={reason}
          onChangeText={(t) => {
            setReason(t);
            setMissing(false);
            setConfirming(false);
          }}
          error={missing ? `Give a reason for ${verdict === 'approved' ? 'approving' : 'rejecting'}: it is what the grower reads.` : serverReason}
        />
      )}
      {verdict !== null && confirming ? (
        <ConfirmBox
          question={`Close the order as ${word}?`}
          consequence={`The order closes for good: the grower can take no further step and cannot upload again. The grower is e-mailed the verdict and your reason.`}
          confirmLabel={`Yes, close as ${word}`}
          busyLabel="Closing…"
          busy={close.isPending}
          onConfirm={() => close.mutate({ verdict, reason: reason.trim() })}
          onCancel={() => setConfirming(false)}
          testID="close-confirm"
        />
      ) : (
        <Button label={verdict === null ? 'Close the order' : `Close as ${word}`} onPress={ask} disabled={verdict === null || close.isPending} />
      )}
      {close.error && !serverReason ? <ErrorNotice title="Not closed" error={close.error} /> : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
