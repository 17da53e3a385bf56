import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSignOutEverywhere } from '@/components/api/auth';
import { errorsFrom } from '@/components/auth/form/form-errors';
import { FormProblem } from '@/components/auth/form/form-alert';
import { spacing } from '@/components/theme';
import { ConfirmBox } from '@/components/ui/confirm-box';
import { RowButton } from '@/components/ui/row-button';

/** Ends every session of the account, on every device, this one too; asks once more first. */
export function SignOutEverywhere() {
  const end = useSignOutEverywhere();
  const [asking, setAsking] = useState(false);
  return (
    <View style={styles.block} testID="sign-out-everywhere">
      {end.error ? <FormProblem title="Not signed out" problem={errorsFrom(end.error, []).banner} /> : null}
      {asking ? (
        <ConfirmBox
          question="Sign out on every device?"
          consequence="Every session of your account ends at once, this one too, and open pages stop receiving live updates. Sign in again where you need to."
          confirmLabel="Sign out everywhere"
          busyLabel="Signing out…"
          busy={end.isPending}
          onConfirm={() => end.mutate()}
          onCancel={() => setAsking(false)}
          testID="confirm-sign-out-everywhere"
        />
      ) : (
        <View style={styles.row}>
          <RowButton label="Sign out everywhere…" onPress={() => setAsking(true)} testID="ask-sign-out-everywhere" />
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: spacing.md },
  row: { flexDirection: 'row' },
});
