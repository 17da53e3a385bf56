import { StyleSheet, View } from 'react-native';
import { fieldLabels } from '@/shared/api/field-labels';
import { spacing } from '@/components/theme';
import { TextField } from '@/components/ui/text-field';
import type { FieldErrors, ModuleText } from './module-form-model';

const optional = (label: string) => `${label} (optional)`;

export type ModuleFieldKey = Exclude<keyof ModuleText, 'p' | 'n' | 'name'>;

/** Each module setting's label, unit and help: the form and the read-only view show the same words. */
export const moduleFieldInfo: [ModuleFieldKey, string, string, string?][] = [
  ['hotSide', fieldLabels.hotSide, 'K'],
  ['deltaT', fieldLabels.deltaT, 'K'],
  ['couples', fieldLabels.couples, 'couples'],
  ['areaRatio', optional(fieldLabels.areaRatio), '–', 'Default: the legs’ own areas'],
  ['contactResistivity', optional(fieldLabels.contactResistivity), 'Ω·m²', 'Blank: each run leg’s design contacts; a value replaces them'],
  ['coldPlateResistance', optional(fieldLabels.coldPlateResistance), 'K/W'],
  ['hotPlateResistance', optional(fieldLabels.hotPlateResistance), 'K/W'],
  ['currentLimit', optional(fieldLabels.currentLimit), 'A', 'Currents above it are flagged'],
];

/** The module's numbers: conditions, couples, contacts, plates and the current limit. */
export function ModuleFields({ value, onChange, errors }: { value: ModuleText; onChange: (v: ModuleText) => void; errors: FieldErrors }) {
  return (
    <View style={styles.grid}>
      {moduleFieldInfo.map(([key, label, unit, help]) => (
        <View key={key} style={styles.field}>
          <TextField id={`module-${key}`} label={label} unit={unit} help={help} mono value={value[key]} onChangeText={(t) => onChange({ ...value, [key]: t })} error={errors[key]} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  // Inputs line up along each row even where a label wraps or a field has a help line.
  grid: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: spacing.md },
  // Room for the input's own minimum width and a unit as long as "couples" or "Ω·m²" beside it.
  field: { flexGrow: 1, flexBasis: 280 },
});
