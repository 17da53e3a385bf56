import { useState } from 'react';
import { Pressable, StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, radii, spacing, type as typeScale } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

/** What the field holds; sets the keyboard and what password managers fill in. */
export type AccountFieldKind = 'email' | 'current-password' | 'new-password' | 'name' | 'team';

const inputProps: Record<AccountFieldKind, TextInputProps> = {
  email: { autoComplete: 'email', keyboardType: 'email-address', inputMode: 'email', autoCapitalize: 'none' },
  'current-password': { autoComplete: 'current-password', secureTextEntry: true, autoCapitalize: 'none' },
  'new-password': { autoComplete: 'new-password', secureTextEntry: true, autoCapitalize: 'none' },
  name: { autoComplete: 'name', autoCapitalize: 'words' },
  team: { autoComplete: 'organization', autoCapitalize: 'words' },
};

export type AccountFieldProps = {
  /** Stable id; the input's test id is `field-<id>`, its error's `error-<id>`. */
  id: string;
  label: string;
  kind: AccountFieldKind;
  value: string;
  onChangeText: (text: string) => void;
  error?: string;
  help?: string;
  /** Enter in the field submits the form. */
  onSubmit?: () => void;
};

/** A labelled account input; passwords can be shown; an error sits under it with a sign and words. */
export function AccountField(props: AccountFieldProps) {
  const { id, label, kind, value, onChangeText, error, help, onSubmit } = props;
  const secret = kind === 'current-password' || kind === 'new-password';
  const [revealed, setRevealed] = useState(false);
  const labelId = `${id}-label`;
  return (
    <View style={styles.field}>
      <AppText variant="label" nativeID={labelId}>
        {label}
      </AppText>
      <View style={[styles.box, error ? styles.invalid : null]}>
        <TextInput
          {...inputProps[kind]}
          secureTextEntry={secret && !revealed}
          testID={`field-${id}`}
          aria-labelledby={labelId}
          accessibilityLabel={label}
          aria-invalid={error !== undefined}
          value={value}
          onChangeText={onChangeText}
          onSubmitEditing={onSubmit}
          autoCorrect={false}
          placeholderTextColor={colors.textFaint}
          style={styles.input}
        />
        {secret ? (
          <Pressable
            accessibilityRole="button"
            accessibilityLabel={revealed ? `Hide ${label.toLowerCase()}` : `Show ${label.toLowerCase()}`}
            onPress={() => setRevealed((shown) => !shown)}
            style={styles.reveal}
          >
            <AppText variant="label" tone="primary">
              {revealed ? 'Hide' : 'Show'}
            </AppText>
          </Pressable>
        ) : null}
      </View>
      {help && !error ? (
        <AppText variant="caption" tone="muted">
          {help}
        </AppText>
      ) : null}
      {error ? (
        <View style={styles.error} role="alert" testID={`error-${id}`}>
          <Glyph name="cross" color={colors.danger} />
          <AppText variant="caption" tone="danger" style={styles.errorText}>
            {error}
          </AppText>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  box: {
    flexDirection: 'row',
    alignItems: 'center',
    backgroundColor: colors.field,
    borderWidth: 1,
    borderColor: colors.border,
    borderRadius: radii.md,
    minHeight: 44,
  },
  input: {
    ...typeScale.body,
    flex: 1,
    color: colors.text,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    minHeight: 42,
  },
  reveal: { paddingHorizontal: spacing.md, alignSelf: 'stretch', justifyContent: 'center' },
  invalid: { borderColor: colors.danger, borderWidth: 1.5 },
  error: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  errorText: { flex: 1 },
});
