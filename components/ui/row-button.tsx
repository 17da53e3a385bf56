import { Pressable, StyleSheet } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from './text';

export type RowButtonTone = 'primary' | 'quiet' | 'danger';

export type RowButtonProps = {
  label: string;
  onPress: () => void;
  tone?: RowButtonTone;
  disabled?: boolean;
  /** Spoken name when the label alone is ambiguous in a list ("Remove Piet Jansen"). */
  accessibilityLabel?: string;
  testID?: string;
};

/** A compact button for actions inside a list row; `danger` only for the final step of a removal. */
export function RowButton({ label, onPress, tone = 'quiet', disabled = false, accessibilityLabel, testID }: RowButtonProps) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      accessibilityState={{ disabled }}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [styles.base, boxes[tone], pressed && styles.pressed, disabled && styles.disabled]}
    >
      <AppText variant="label" style={labels[tone]}>
        {label}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: 36,
    justifyContent: 'center',
    borderRadius: radii.md,
    borderWidth: 1,
    paddingHorizontal: spacing.md,
  },
  pressed: { opacity: 0.8 },
  disabled: { opacity: 0.5 },
});

const boxes = StyleSheet.create({
  primary: { backgroundColor: colors.primary, borderColor: colors.primary },
  quiet: { backgroundColor: colors.surface, borderColor: colors.border },
  danger: { backgroundColor: colors.danger, borderColor: colors.danger },
});

const labels = StyleSheet.create({
  primary: { color: colors.onPrimary },
  quiet: { color: colors.primary },
  danger: { color: colors.onPrimary },
});
