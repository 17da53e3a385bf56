import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Chip } from './chip';
import { AppText } from './text';

export type Choice<T extends string> = { value: T; label: string };

type Props<T extends string> = { id: string; label: string; choices: readonly Choice<T>[]; value: T; onChange: (v: T) => void; hint?: string };

/** One of a few settings, as labelled radio chips (test ids `<id>-<value>`), with a line saying what the choice means. */
export function ChoiceChips<T extends string>({ id, label, choices, value, onChange, hint }: Props<T>) {
  return (
    <View style={styles.field}>
      <AppText variant="label" nativeID={`${id}-label`}>
        {label}
      </AppText>
      <View style={styles.chips} role="radiogroup" aria-labelledby={`${id}-label`}>
        {choices.map((c) => (
          <Chip key={c.value} role="radio" label={c.label} selected={value === c.value} onPress={() => onChange(c.value)} testID={`${id}-${c.value}`} />
        ))}
      </View>
      {hint ? (
        <AppText variant="caption" tone="muted">
          {hint}
        </AppText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
