import { StyleSheet, TextInput, View, type KeyboardTypeOptions } from 'react-native';
import { colors, fonts, radii, spacing, type as typeScale } from '@/components/theme';
import { Glyph } from './glyph';
import { AppText } from './text';

export type TextFieldProps = {
  /** Stable id, also used for the test id (`field-<id>`). */
  id: string;
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  /** Shown after the input, e.g. "cm²/(V·s)". */
  unit?: string;
  /** One line under the label: what the value means. */
  help?: string;
  error?: string;
  placeholder?: string;
  required?: boolean;
  multiline?: boolean;
  keyboardType?: KeyboardTypeOptions;
  /** Numbers and units in mono type. */
  mono?: boolean;
};

/** A labelled input; an error sits right under it with a sign and words. */
export function TextField(props: TextFieldProps) {
  const { id, label, value, onChangeText, unit, help, error, placeholder, required = false } = props;
  const { multiline = false, keyboardType, mono = false } = props;
  const labelId = `${id}-label`;
  return (
    <View style={styles.field}>
      <AppText variant="label" nativeID={labelId}>
        {label}
        {required ? <AppText variant="label" tone="muted">{' · required'}</AppText> : null}
      </AppText>
      {help ? (
        <AppText variant="caption" tone="muted">
          {help}
        </AppText>
      ) : null}
      <View style={styles.inputRow}>
        <TextInput
          testID={`field-${id}`}
          aria-labelledby={labelId}
          accessibilityLabel={label}
          aria-invalid={error !== undefined}
          value={value}
          onChangeText={onChangeText}
          placeholder={placeholder}
          placeholderTextColor={colors.textFaint}
          multiline={multiline}
          keyboardType={keyboardType}
          autoCapitalize="none"
          autoCorrect={false}
          style={[styles.input, mono && styles.mono, multiline && styles.multiline, error ? styles.invalid : null]}
        />
        {unit ? (
          <AppText variant="mono" tone="muted" style={styles.unit}>
            {unit}
          </AppText>
        ) : null}
      </View>
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
  inputRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  input: {
    ...typeScale.body,
    flex: 1,
    color: colors.text,
    backgroundColor: colors.field,
    borderWidth: 1,
    borderColor: colors.border,
    borderRadius: radii.md,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    minHeight: 42,
  },
  mono: { fontFamily: fonts.mono },
  multiline: { minHeight: 84, textAlignVertical: 'top' },
  invalid: { borderColor: colors.danger, borderWidth: 1.5 },
  unit: { minWidth: 72 },
  error: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  errorText: { flex: 1 },
});
