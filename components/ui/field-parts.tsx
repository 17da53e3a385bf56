import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing, type as typeScale } from '@/components/theme';
import { Glyph } from './glyph';
import { AppText } from './text';

/** An error in words beside a cross, announced as an alert; nothing when there is none. */
export function ErrorLine({ message, testID }: { message?: string; testID?: string }) {
  if (!message) return null;
  return (
    <View style={styles.error} role="alert" testID={testID}>
      <Glyph name="cross" color={colors.danger} />
      <AppText variant="caption" tone="danger" style={styles.errorText}>
        {message}
      </AppText>
    </View>
  );
}

/** The label's native id, which the input names as its label. */
export function fieldLabelId(id: string): string {
  return `${id}-label`;
}

/**
 * What ties a field's input to its label and error: the input's test id
 * (`field-<id>`), the label it is read by (`<id>-label`) and whether it is invalid.
 */
export function fieldInputProps(id: string, label: string, error: string | undefined) {
  return { testID: `field-${id}`, 'aria-labelledby': fieldLabelId(id), accessibilityLabel: label, 'aria-invalid': error !== undefined };
}

/** The looks every text input shares: the frame, the text inside it, and the frame when invalid. */
export const fieldStyles = StyleSheet.create({
  frame: {
    backgroundColor: colors.field,
    borderWidth: 1,
    borderColor: colors.border,
    borderRadius: radii.md,
  },
  text: {
    ...typeScale.body,
    flex: 1,
    color: colors.text,
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    minHeight: 42,
  },
  invalid: { borderColor: colors.danger, borderWidth: 1.5 },
});

const styles = StyleSheet.create({
  error: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xs },
  errorText: { flex: 1 },
});
