import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useCancelRun } from '@/components/api/runs';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';

/** Cancel with one confirmation: a running run stops within about a second and keeps its best so far. */
export function CancelRun({ runId }: { runId: string }) {
  const [asking, setAsking] = useState(false);
  const cancel = useCancelRun();
  if (cancel.isSuccess) {
    return (
      <AppText tone="muted" testID="cancel-requested">
        Cancel requested: the worker stops at its next check and keeps the best result so far.
      </AppText>
    );
  }
  return (
    <View style={styles.wrap}>
      {asking ? (
        <Notice tone="warning" title="Stop this run?">
          <AppText>The best result found so far is kept and marked as cancelled; the rest of the search is not done.</AppText>
          <View style={styles.buttons}>
            <Button label={cancel.isPending ? 'Stopping…' : 'Stop the run'} onPress={() => cancel.mutate(runId)} disabled={cancel.isPending} />
            <Button label="Keep running" variant="quiet" onPress={() => setAsking(false)} disabled={cancel.isPending} />
          </View>
        </Notice>
      ) : (
        <Button label="Cancel run" variant="quiet" onPress={() => setAsking(true)} />
      )}
      {cancel.error ? (
        <Notice tone="danger" title="Not cancelled">
          <AppText>{cancel.error.message}</AppText>
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginTop: spacing.xs },
});
