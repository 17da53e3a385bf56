import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { TextField } from '@/components/ui/text-field';
import type { FieldErrors, ModuleText } from './module-form-model';

export type ModuleFieldKey = Exclude<keyof ModuleText, 'p' | 'n' | 'name'>;

/** Each module setting's label, unit and help: the form and the read-only view show the same words. */
export const moduleFieldInfo: [ModuleFieldKey, string, string, string?][] = [
  ['hotSide', 'Hot side Th', 'K'],
  ['deltaT', 'ΔT', 'K'],
  ['couples', 'Couples N', 'couples'],
  ['areaRatio', 'Area ratio A_n / A_p (optional)', '–', 'Default: the legs’ own areas'],
  ['contactResistivity', 'Contact resistivity per junction (optional)', 'Ω·m²', 'Blank: each run leg’s design contacts; a value replaces them'],
  ['coldPlateResistance', 'Cold plate thermal resistance (optional)', 'K/W'],
  ['hotPlateResistance', 'Hot plate thermal resistance (optional)', 'K/W'],
  ['currentLimit', 'Supply or wire current limit (optional)', 'A', 'Currents above it are flagged'],
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
