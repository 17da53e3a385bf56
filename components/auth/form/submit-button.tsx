import { ActivityIndicator, Pressable, StyleSheet } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

export type SubmitButtonProps = {
  label: string;
  /** Shown while the request is on its way, e.g. "Signing in…". */
  busyLabel: string;
  busy: boolean;
  onPress: () => void;
  testID?: string;
};

/** The one full-width primary action of a form; it cannot be pressed twice. */
export function SubmitButton({ label, busyLabel, busy, onPress, testID }: SubmitButtonProps) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ disabled: busy, busy }}
      accessibilityLabel={busy ? busyLabel : label}
      disabled={busy}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [styles.button, pressed && styles.pressed, busy && styles.busy]}
    >
      {busy ? <ActivityIndicator color={colors.onPrimary} size="small" /> : null}
      <AppText variant="bodyStrong" style={styles.label}>
        {busy ? busyLabel : label}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.sm,
    minHeight: 46,
    borderRadius: radii.md,
    paddingHorizontal: spacing.lg,
    backgroundColor: colors.primary,
  },
  pressed: { backgroundColor: colors.primaryPressed },
  busy: { opacity: 0.8 },
  label: { color: colors.onPrimary },
});
