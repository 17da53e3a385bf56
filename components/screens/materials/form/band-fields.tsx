import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { bandParameters, carrierExplanation, minorityExplanation, minorityParameters, type BandNumberKey, type MinorityKey, type ParameterInfo } from '../band-parameters';
import { carrierLabel } from '../family-labels';
import type { FamilyFormValues, FieldErrors } from './family-form-model';

export type BandFieldsProps = {
  values: FamilyFormValues;
  errors: FieldErrors;
  onCarrier: (carrier: 'p' | 'n') => void;
  onNumber: (key: BandNumberKey, text: string) => void;
  onTwoBands: (twoBands: boolean) => void;
  onMinority: (key: MinorityKey, text: string) => void;
};

/** One number of the model: label with symbol, unit, meaning, example. */
function NumberField<K extends string>({ p, id, value, error, onChange }: { p: ParameterInfo<K>; id: string; value: string; error?: string; onChange: (text: string) => void }) {
  return (
    <TextField
      id={id}
      label={`${p.label} ${p.symbol}`}
      unit={p.unit || 'no unit'}
      help={p.explanation}
      placeholder={`e.g. ${p.example}`}
      value={value}
      onChangeText={onChange}
      error={error}
      keyboardType="numbers-and-punctuation"
      required
      mono
    />
  );
}

/** Carrier type, the five numbers of the majority band and, for a two-band family, the five of the minority band. */
export function BandFields({ values, errors, onCarrier, onNumber, onTwoBands, onMinority }: BandFieldsProps) {
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
        <NumberField key={p.key} p={p} id={p.key} value={values.numbers[p.key]} error={errors[`definition.${p.key}`]} onChange={(text) => onNumber(p.key, text)} />
      ))}
      <View style={styles.carrier}>
        <AppText variant="label" nativeID="bands-label">
          Minority band (bipolar conduction)
        </AppText>
        <AppText variant="caption" tone="muted">
          {minorityExplanation}
        </AppText>
        <View style={styles.chips} role="radiogroup" aria-labelledby="bands-label">
          <Chip role="radio" label="One band" selected={!values.twoBands} onPress={() => onTwoBands(false)} testID="bands-one" />
          <Chip role="radio" label="Two bands" selected={values.twoBands} onPress={() => onTwoBands(true)} testID="bands-two" />
        </View>
        {errors['definition.minority'] ? (
          <AppText variant="caption" tone="danger" role="alert">
            {errors['definition.minority']}
          </AppText>
        ) : null}
      </View>
      {values.twoBands
        ? minorityParameters.map((p) => (
            <NumberField
              key={p.key}
              p={p}
              id={`minority-${p.key}`}
              value={values.minority[p.key]}
              error={errors[`definition.minority.${p.key}`]}
              onChange={(text) => onMinority(p.key, text)}
            />
          ))
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
  carrier: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginTop: spacing.xxs },
});
