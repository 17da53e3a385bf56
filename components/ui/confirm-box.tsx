import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from './glyph';
import { AppText } from './text';
import { RowButton } from './row-button';

export type ConfirmBoxProps = {
  question: string;
  /** What happens, in a sentence. */
  consequence: string;
  confirmLabel: string;
  busyLabel: string;
  busy: boolean;
  onConfirm: () => void;
  onCancel: () => void;
  testID?: string;
};

/** The second step of a destructive action, inside the row it concerns. */
export function ConfirmBox(props: ConfirmBoxProps) {
  const { question, consequence, confirmLabel, busyLabel, busy, onConfirm, onCancel, testID } = props;
  return (
    <View style={styles.box} role="alert" testID={testID}>
      <View style={styles.title}>
        <Glyph name="cross" color={colors.danger} />
        <AppText variant="label" tone="danger" style={styles.text}>
          {question}
        </AppText>
      </View>
      <AppText variant="caption">{consequence}</AppText>
      <View style={styles.buttons}>
        <RowButton label={busy ? busyLabel : confirmLabel} tone="danger" onPress={onConfirm} disabled={busy} testID="confirm" />
        <RowButton label="Keep" onPress={onCancel} disabled={busy} testID="cancel" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    // Its own full-width line, also inside a wrapping row of actions.
    width: '100%',
    gap: spacing.sm,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.danger,
    backgroundColor: colors.dangerSoft,
  },
  title: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  text: { flex: 1 },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
