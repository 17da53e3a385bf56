import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { TextField } from '@/components/ui/text-field';
import type { FieldErrors } from './family-form-model';

export type ProvenanceValues = { name: string; source: string; summary: string };

export type ProvenanceFieldsProps = {
  values: ProvenanceValues;
  errors: FieldErrors;
  onChange: (field: keyof ProvenanceValues, text: string) => void;
};

/** Name, where the numbers come from, and a one-paragraph summary. */
export function ProvenanceFields({ values, errors, onChange }: ProvenanceFieldsProps) {
  return (
    <View style={styles.fields}>
      <TextField
        id="name"
        label="Name"
        help="How the team will find it, e.g. the ingot or the model it describes."
        placeholder="e.g. Batch 7 p-type, Hall + Seebeck"
        value={values.name}
        onChangeText={(text) => onChange('name', text)}
        error={errors.name}
        required
      />
      <TextField
        id="source"
        label="Source"
        help="Where the numbers come from: measurements, samples, batch, reference."
        placeholder="e.g. Hall and Seebeck on 12 samples, ingot batch 7"
        value={values.source}
        onChangeText={(text) => onChange('source', text)}
        error={errors.source}
        multiline
        required
      />
      <TextField
        id="summary"
        label="Summary"
        help="Optional: what is special about this family."
        value={values.summary}
        onChangeText={(text) => onChange('summary', text)}
        error={errors.summary}
        multiline
      />
    </View>
  );
}

const styles = StyleSheet.create({
  fields: { gap: spacing.lg },
});
