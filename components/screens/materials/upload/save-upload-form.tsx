import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { NotSavedNotice } from '@/components/ui/not-saved-notice';
import { saveErrors } from '@/components/ui/save-errors';
import { AppText } from '@/components/ui/text';
import { splitApiErrors, type FieldErrors } from '../form/family-form-model';
import { ProvenanceFields, type ProvenanceValues } from '../form/provenance-fields';

export type SaveUploadFormProps = {
  /** Only a file without errors may be saved. */
  canSave: boolean;
  pending: boolean;
  error: Error | null;
  onSave: (values: ProvenanceValues) => void;
};

function localErrors(values: ProvenanceValues): FieldErrors {
  const errors: FieldErrors = {};
  if (values.name.trim() === '') errors.name = 'Name is required';
  if (values.source.trim() === '') errors.source = 'Source is required: say where the numbers come from';
  return errors;
}

/** Name, source and summary for the measured family, and the one Save. */
export function SaveUploadForm({ canSave, pending, error, onSave }: SaveUploadFormProps) {
  const [values, setValues] = useState<ProvenanceValues>({ name: '', source: '', summary: '' });
  const [tried, setTried] = useState(false);
  const server = saveErrors(error, splitApiErrors);
  const errors = { ...server.byField, ...(tried ? localErrors(values) : {}) };
  const submit = () => {
    setTried(true);
    if (Object.keys(localErrors(values)).length === 0) onSave({ name: values.name.trim(), source: values.source.trim(), summary: values.summary.trim() });
  };
  return (
    <View style={styles.form}>
      <ProvenanceFields values={values} errors={errors} onChange={(field, text) => setValues((v) => ({ ...v, [field]: text }))} />
      {server.message !== undefined ? <NotSavedNotice message={server.message} details={server.other} testID="save-error" /> : null}
      <AppText variant="caption" tone="muted">
        {canSave
          ? 'Saving stores every row or none. The family starts at version 1.'
          : 'Saving is possible once the file has no errors.'}
      </AppText>
      <Button label={pending ? 'Saving…' : 'Save measured family'} onPress={submit} disabled={!canSave || pending} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg, maxWidth: 720 },
});
