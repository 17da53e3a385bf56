import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { Objective } from '@/shared/api/designs';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { objectiveInfo } from '../runs/run-format';
import { designFieldInfo, type DesignNumberKey } from './design-fields';
import type { DesignFormValues, FieldErrors } from './design-form-model';
import { DesignNumberField } from './design-number-field';
import { FamilyPicker } from './family-picker';

export type SectionProps = {
  values: DesignFormValues;
  errors: FieldErrors;
  onNumber: (field: DesignNumberKey, text: string) => void;
  onChange: (patch: Partial<DesignFormValues>) => void;
};

const objectives: Objective[] = ['maxDeltaT', 'maxHeatLoad', 'maxCop'];
const objectiveHelp: Record<Objective, string> = {
  maxDeltaT: 'Coldest cold side at the given heat load.',
  maxHeatLoad: 'Most heat pumped while holding the cold-side target.',
  maxCop: 'Least electrical power for the given heat load and cold-side target.',
};

/** Two fields side by side when there is room, stacked on a phone. */
export function Pair({ children }: { children: [ReactNode, ReactNode] }) {
  return (
    <View style={styles.pair}>
      <View style={styles.pairItem}>{children[0]}</View>
      <View style={styles.pairItem}>{children[1]}</View>
    </View>
  );
}

export function LegSection({ values, errors, onNumber, onChange }: SectionProps) {
  const row = { values, errors, onNumber };
  return (
    <Section title="Leg and material" hint="The leg's shape and what it is made of.">
      <TextField
        id="name"
        label={designFieldInfo.name.label}
        help={designFieldInfo.name.help}
        value={values.name}
        onChangeText={(name) => onChange({ name })}
        error={errors.name}
        placeholder="e.g. Detector stage p-leg, 1.5 mm"
        required
      />
      <FamilyPicker
        familyId={values.familyId}
        familyVersion={values.familyVersion}
        error={errors.familyId ?? errors.familyVersion}
        onChange={(familyId, familyVersion) => onChange({ familyId, familyVersion })}
      />
      <Pair>
        <DesignNumberField field="lengthMm" {...row} required />
        <DesignNumberField field="areaMm2" {...row} required />
      </Pair>
    </Section>
  );
}

export function OperatingSection({ values, errors, onNumber, onChange }: SectionProps) {
  const row = { values, errors, onNumber };
  return (
    <Section title="Operating point" hint="Where the leg works and what counts as better.">
      <View style={styles.field}>
        <AppText variant="label" nativeID="objective-label">
          {designFieldInfo.objective.label}
        </AppText>
        <View style={styles.chips} role="radiogroup" aria-labelledby="objective-label">
          {objectives.map((o) => (
            <Chip key={o} role="radio" label={objectiveInfo[o].goal} selected={values.objective === o} onPress={() => onChange({ objective: o })} />
          ))}
        </View>
        <AppText variant="caption" tone="muted">
          {objectiveHelp[values.objective]}
        </AppText>
      </View>
      <DesignNumberField field="hotSide" {...row} required />
      {values.objective === 'maxHeatLoad' ? null : <DesignNumberField field="heatLoad" {...row} required={values.objective === 'maxCop'} />}
      {values.objective === 'maxDeltaT' ? null : <DesignNumberField field="coldSide" {...row} required />}
    </Section>
  );
}

export function GrowerSection({ values, errors, onNumber, onChange }: SectionProps) {
  const row = { values, errors, onNumber };
  return (
    <Section title="What the grower can make" hint="The optimiser stays inside these limits.">
      <Pair>
        <DesignNumberField field="minPerCm3" {...row} required />
        <DesignNumberField field="maxPerCm3" {...row} required />
      </Pair>
      <DesignNumberField field="controlPoints" {...row} />
      <View style={styles.field}>
        <Chip label={designFieldInfo.monotone.label} selected={values.monotone} onPress={() => onChange({ monotone: !values.monotone })} testID="field-monotone" />
        <AppText variant="caption" tone="muted">
          {designFieldInfo.monotone.help}
        </AppText>
      </View>
      <DesignNumberField field="minZoneMm" {...row} />
    </Section>
  );
}

export function SearchSection({ values, errors, onNumber, onChange }: SectionProps) {
  return (
    <Section title="Search and notes">
      <DesignNumberField field="starts" values={values} errors={errors} onNumber={onNumber} />
      <TextField
        id="notes"
        label={designFieldInfo.notes.label}
        help={designFieldInfo.notes.help}
        value={values.notes}
        onChangeText={(notes) => onChange({ notes })}
        error={errors.notes}
        multiline
      />
    </Section>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  pairItem: { flexGrow: 1, flexBasis: 240 },
});
