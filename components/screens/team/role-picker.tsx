import { Pressable, StyleSheet, View } from 'react-native';
import { roles, type Role } from '@/shared/api/auth';
import { roleLabels, roleSummaries } from '@/components/auth/permissions';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

export type RolePickerProps = {
  /** Names the group for assistive technology, e.g. "Role for Piet Jansen". */
  label: string;
  value: Role;
  onChange: (role: Role) => void;
  disabled?: boolean;
};

/** One of the four roles, each with what it may do; the choice is marked by a tick, not colour alone. */
export function RolePicker({ label, value, onChange, disabled = false }: RolePickerProps) {
  return (
    <View role="radiogroup" aria-label={label} style={styles.group}>
      {roles.map((role) => {
        const selected = role === value;
        return (
          <Pressable
            key={role}
            role="radio"
            aria-checked={selected}
            accessibilityState={{ checked: selected, disabled }}
            accessibilityLabel={roleLabels[role]}
            disabled={disabled}
            onPress={() => onChange(role)}
            testID={`role-${role}`}
            style={({ pressed }) => [styles.option, selected ? styles.on : styles.off, pressed && styles.pressed]}
          >
            <Glyph name={selected ? 'check' : 'ring'} color={selected ? colors.primary : colors.textFaint} />
            <View style={styles.text}>
              <AppText variant="label" tone={selected ? 'primary' : 'default'}>
                {roleLabels[role]}
              </AppText>
              <AppText variant="caption" tone="muted">
                {roleSummaries[role]}
              </AppText>
            </View>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  option: {
    flexGrow: 1,
    flexBasis: 220,
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: spacing.sm,
    padding: spacing.sm,
    borderRadius: radii.md,
    borderWidth: 1,
  },
  on: { borderColor: colors.primary, backgroundColor: colors.primarySoft, borderWidth: 1.5 },
  off: { borderColor: colors.border, backgroundColor: colors.surface },
  pressed: { opacity: 0.85 },
  text: { flex: 1, gap: spacing.xxs },
});
