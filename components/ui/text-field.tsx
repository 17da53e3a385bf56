import { StyleSheet, TextInput, View, type KeyboardTypeOptions } from 'react-native';
import { colors, fonts, spacing } from '@/components/theme';
import { ErrorLine, fieldInputProps, fieldLabelId, fieldStyles } from './field-parts';
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
  return (
    <View style={styles.field}>
      <AppText variant="label" nativeID={fieldLabelId(id)}>
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
          {...fieldInputProps(id, label, error)}
          value={value}
          onChangeText={onChangeText}
          placeholder={placeholder}
          placeholderTextColor={colors.textFaint}
          multiline={multiline}
          keyboardType={keyboardType}
          autoCapitalize="none"
          autoCorrect={false}
          style={[fieldStyles.frame, fieldStyles.text, mono && styles.mono, multiline && styles.multiline, error ? fieldStyles.invalid : null]}
        />
        {unit ? (
          <AppText variant="mono" tone="muted" style={styles.unit}>
            {unit}
          </AppText>
        ) : null}
      </View>
      <ErrorLine message={error} testID={`error-${id}`} />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  inputRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  mono: { fontFamily: fonts.mono },
  multiline: { minHeight: 84, textAlignVertical: 'top' },
  unit: { minWidth: 72 },
});
