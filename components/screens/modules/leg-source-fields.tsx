import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { FamilyChoiceChips } from '@/components/screens/designs/family-choice-chips';
import { ErrorLine } from '@/components/ui/field-parts';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { FieldErrors, LegText } from './module-form-model';
import { RunLegPicker } from './run-leg-picker';

const legNames: [LegText['leg'], string][] = [
  ['optimum', 'Graded optimum'],
  ['uniform', 'Best uniform'],
  ['localBestZt', 'Local-best zT'],
];

type Props = { side: 'p' | 'n'; value: LegText; onChange: (v: LegText) => void; errors: FieldErrors };

/** One leg of the couple: a stored run's leg, or a family at uniform doping with its length and area. */
export function LegSourceFields({ side, value, onChange, errors }: Props) {
  const set = (patch: Partial<LegText>) => onChange({ ...value, ...patch });
  return (
    <View style={styles.wrap} testID={`leg-${side}`}>
      <AppText variant="bodyStrong">{side}-type leg</AppText>
      <View style={styles.chips}>
        <Chip role="radio" label="From a run" selected={value.kind === 'run'} onPress={() => set({ kind: 'run' })} testID={`${side}-kind-run`} />
        <Chip role="radio" label="Family at uniform doping" selected={value.kind === 'family'} onPress={() => set({ kind: 'family' })} testID={`${side}-kind-family`} />
      </View>
      {value.kind === 'run' ? (
        <>
          <RunLegPicker side={side} runId={value.runId} onPick={(runId) => set({ runId })} error={errors[`${side}.runId`]} />
          <View style={styles.chips}>
            {legNames.map(([leg, label]) => (
              <Chip key={leg} role="radio" label={label} selected={value.leg === leg} onPress={() => set({ leg })} testID={`${side}-leg-${leg}`} />
            ))}
          </View>
        </>
      ) : (
        <>
          <FamilyChoiceChips
            id={`${side}-family`}
            selectedId={value.familyId}
            onPick={(f) => set({ familyId: f.id })}
            fits={(f) => f.carrier === side || f.carrier === null}
            chipLabel={(f) => f.name}
            chipTestID={(f) => `${side}-family-${f.id}`}
            ariaLabel={`Family of the ${side}-type leg`}
          />
          <ErrorLine message={errors[`${side}.familyId`]} testID={`${side}-family-error`} />
          <TextField id={`${side}-per-cm3`} label="Doping n" unit="cm⁻³" mono value={value.perCm3} onChangeText={(perCm3) => set({ perCm3 })} error={errors[`${side}.perCm3`]} />
          <TextField id={`${side}-length`} label="Leg length" unit="mm" mono value={value.lengthMm} onChangeText={(lengthMm) => set({ lengthMm })} error={errors[`${side}.lengthMm`]} />
          <TextField id={`${side}-area`} label="Leg area" unit="mm²" mono value={value.areaMm2} onChangeText={(areaMm2) => set({ areaMm2 })} error={errors[`${side}.areaMm2`]} />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flexGrow: 1, flexBasis: 300, gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
