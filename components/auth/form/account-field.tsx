import { useState } from 'react';
import { Pressable, StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, spacing } from '@/components/theme';
import { ErrorLine, fieldInputProps, fieldLabelId, fieldStyles } from '@/components/ui/field-parts';
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

/** Under a new password: what the shared schema asks for, and a hint. */
export const newPasswordHelp = 'At least 10 characters; a few unrelated words work well';

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
  return (
    <View style={styles.field}>
      <AppText variant="label" nativeID={fieldLabelId(id)}>
        {label}
      </AppText>
      <View style={[fieldStyles.frame, styles.box, error ? fieldStyles.invalid : null]}>
        <TextInput
          {...inputProps[kind]}
          secureTextEntry={secret && !revealed}
          {...fieldInputProps(id, label, error)}
          value={value}
          onChangeText={onChangeText}
          onSubmitEditing={onSubmit}
          autoCorrect={false}
          placeholderTextColor={colors.textFaint}
          style={fieldStyles.text}
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
      <ErrorLine message={error} testID={`error-${id}`} />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  box: { flexDirection: 'row', alignItems: 'center', minHeight: 44 },
  reveal: { paddingHorizontal: spacing.md, alignSelf: 'stretch', justifyContent: 'center' },
});
