import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { FamilyChoiceChips } from '@/components/screens/designs/family-choice-chips';
import { ErrorLine } from '@/components/ui/field-parts';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { FieldErrors, LegText } from './module-form-model';
import { DesignLegPicker } from './design-leg-picker';
import { RunLegPicker } from './run-leg-picker';

const legNames: [LegText['leg'], string][] = [
  ['optimum', 'Graded optimum'],
  ['uniform', 'Best uniform'],
  ['localBestZt', 'Local-best zT'],
];

type Props = {
  side: 'p' | 'n';
  value: LegText;
  onChange: (v: LegText) => void;
  errors: FieldErrors;
  /** Where the leg's fields sit in the payload, for its messages ("p", "stages.0.source.p"); the side by default. */
  path?: string;
  /** Offer a leg design whose profile is optimised with the other leg (matched couples). */
  allowDesign?: boolean;
  /** Prefix of the test ids (several stages hold a p and an n leg each). */
  idPrefix?: string;
};

/** One leg of the couple: a stored run's leg, or a family at uniform doping with its length and area (or a leg design to optimise). */
export function LegSourceFields({ side, value, onChange, errors: all, path = side, allowDesign = false, idPrefix = '' }: Props) {
  const set = (patch: Partial<LegText>) => onChange({ ...value, ...patch });
  // The fields below read their messages by side ("p.runId"), wherever the leg sits in the payload.
  const errors: FieldErrors = Object.fromEntries(Object.entries(all).filter(([k]) => k.startsWith(`${path}.`)).map(([k, v]) => [`${side}.${k.slice(path.length + 1)}`, v]));
  const id = `${idPrefix}${side}`;
  return (
    <View style={styles.wrap} testID={`leg-${id}`}>
      <AppText variant="bodyStrong">{side}-type leg</AppText>
      <View style={styles.chips}>
        {allowDesign ? <Chip role="radio" label="Leg design, optimised" selected={value.kind === 'design'} onPress={() => set({ kind: 'design' })} testID={`${id}-kind-design`} /> : null}
        <Chip role="radio" label="From a run" selected={value.kind === 'run'} onPress={() => set({ kind: 'run' })} testID={`${id}-kind-run`} />
        <Chip role="radio" label="Family at uniform doping" selected={value.kind === 'family'} onPress={() => set({ kind: 'family' })} testID={`${id}-kind-family`} />
      </View>
      {value.kind === 'design' ? (
        <DesignLegPicker side={side} idPrefix={idPrefix} designId={value.designId} onPick={(designId) => set({ designId })} error={errors[`${side}.designId`]} />
      ) : value.kind === 'run' ? (
        <>
          <RunLegPicker side={side} idPrefix={idPrefix} runId={value.runId} onPick={(runId) => set({ runId })} error={errors[`${side}.runId`]} />
          <View style={styles.chips}>
            {legNames.map(([leg, label]) => (
              <Chip key={leg} role="radio" label={label} selected={value.leg === leg} onPress={() => set({ leg })} testID={`${id}-leg-${leg}`} />
            ))}
          </View>
        </>
      ) : (
        <>
          <FamilyChoiceChips
            id={`${id}-family`}
            selectedId={value.familyId}
            onPick={(f) => set({ familyId: f.id })}
            fits={(f) => f.carrier === side || f.carrier === null}
            chipLabel={(f) => f.name}
            chipTestID={(f) => `${id}-family-${f.id}`}
            ariaLabel={`Family of the ${side}-type leg`}
          />
          <ErrorLine message={errors[`${side}.familyId`]} testID={`${id}-family-error`} />
          <TextField id={`${id}-per-cm3`} label="Doping n" unit="cm⁻³" mono value={value.perCm3} onChangeText={(perCm3) => set({ perCm3 })} error={errors[`${side}.perCm3`]} />
          <TextField id={`${id}-length`} label="Leg length" unit="mm" mono value={value.lengthMm} onChangeText={(lengthMm) => set({ lengthMm })} error={errors[`${side}.lengthMm`]} />
          <TextField id={`${id}-area`} label="Leg area" unit="mm²" mono value={value.areaMm2} onChangeText={(areaMm2) => set({ areaMm2 })} error={errors[`${side}.areaMm2`]} />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flexGrow: 1, flexBasis: 300, gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
