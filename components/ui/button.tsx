import { Pressable, StyleSheet } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from './text';

export type ButtonProps = {
  label: string;
  onPress: () => void;
  variant?: 'primary' | 'quiet';
  disabled?: boolean;
};

export function Button({ label, onPress, variant = 'primary', disabled = false }: ButtonProps) {
  const primary = variant === 'primary';
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ disabled }}
      disabled={disabled}
      onPress={onPress}
      style={({ pressed }) => [
        styles.base,
        primary ? styles.primary : styles.quiet,
        pressed && (primary ? styles.primaryPressed : styles.quietPressed),
        disabled && styles.disabled,
      ]}
    >
      <AppText variant="label" style={primary ? styles.primaryLabel : styles.quietLabel}>
        {label}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    alignSelf: 'flex-start',
    borderRadius: radii.md,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
    minHeight: 40,
    justifyContent: 'center',
  },
  primary: { backgroundColor: colors.primary },
  primaryPressed: { backgroundColor: colors.primaryPressed },
  quiet: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border },
  quietPressed: { backgroundColor: colors.surfaceSunken },
  disabled: { opacity: 0.5 },
  primaryLabel: { color: colors.onPrimary },
  quietLabel: { color: colors.primary },
});
