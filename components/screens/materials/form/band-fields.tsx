import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { bandParameters, carrierExplanation, type BandNumberKey } from '../band-parameters';
import { carrierLabel } from '../family-labels';
import type { FamilyFormValues, FieldErrors } from './family-form-model';

export type BandFieldsProps = {
  values: FamilyFormValues;
  errors: FieldErrors;
  onCarrier: (carrier: 'p' | 'n') => void;
  onNumber: (key: BandNumberKey, text: string) => void;
};

/** Carrier type and the five numbers of the single-band model, each with unit and meaning. */
export function BandFields({ values, errors, onCarrier, onNumber }: BandFieldsProps) {
  return (
    <View style={styles.fields}>
      <View style={styles.carrier}>
        <AppText variant="label" nativeID="carrier-label">
          Carrier type
        </AppText>
        <AppText variant="caption" tone="muted">
          {carrierExplanation}
        </AppText>
        <View style={styles.chips} role="radiogroup" aria-labelledby="carrier-label">
          {(['p', 'n'] as const).map((c) => (
            <Chip
              key={c}
              role="radio"
              label={carrierLabel(c).text}
              selected={values.carrier === c}
              onPress={() => onCarrier(c)}
              testID={`carrier-${c}`}
            />
          ))}
        </View>
        {errors['definition.carrier'] ? (
          <AppText variant="caption" tone="danger" role="alert">
            {errors['definition.carrier']}
          </AppText>
        ) : null}
      </View>
      {bandParameters.map((p) => (
        <TextField
          key={p.key}
          id={p.key}
          label={`${p.label} ${p.symbol}`}
          unit={p.unit || 'no unit'}
          help={p.explanation}
          placeholder={`e.g. ${p.example}`}
          value={values.numbers[p.key]}
          onChangeText={(text) => onNumber(p.key, text)}
          error={errors[`definition.${p.key}`]}
          keyboardType="numbers-and-punctuation"
          required
          mono
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
  carrier: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginTop: spacing.xxs },
});
