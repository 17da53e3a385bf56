import { Pressable, StyleSheet } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from './glyph';
import { AppText } from './text';

export type ChipProps = {
  label: string;
  selected: boolean;
  onPress: () => void;
  /** `checkbox` for multi-select sets, `radio` for one-of, `tab` for view filters. */
  role?: 'checkbox' | 'radio' | 'tab';
  disabled?: boolean;
  testID?: string;
};

/** A pill that toggles; a tick (not just colour) shows it is on. */
export function Chip({ label, selected, onPress, role = 'checkbox', disabled = false, testID }: ChipProps) {
  const state = role === 'tab' ? { selected } : { checked: selected };
  return (
    <Pressable
      role={role}
      aria-checked={role === 'tab' ? undefined : selected}
      aria-selected={role === 'tab' ? selected : undefined}
      accessibilityState={{ ...state, disabled }}
      accessibilityLabel={label}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [
        styles.chip,
        selected ? styles.on : styles.off,
        pressed && styles.pressed,
        disabled && styles.disabled,
      ]}
    >
      <Glyph name={selected ? 'check' : 'ring'} color={selected ? colors.onPrimary : colors.textFaint} />
      <AppText variant="label" style={selected ? styles.labelOn : styles.labelOff}>
        {label}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xs,
    borderRadius: radii.pill,
    borderWidth: 1,
    paddingLeft: spacing.sm,
    paddingRight: spacing.md,
    paddingVertical: spacing.xxs,
    minHeight: 34,
    // A long label wraps inside the pill instead of running out of its card.
    maxWidth: '100%',
  },
  on: { backgroundColor: colors.primary, borderColor: colors.primary },
  off: { backgroundColor: colors.surface, borderColor: colors.border },
  pressed: { opacity: 0.85 },
  disabled: { opacity: 0.5 },
  labelOn: { color: colors.onPrimary, flexShrink: 1 },
  labelOff: { color: colors.text, flexShrink: 1 },
});
