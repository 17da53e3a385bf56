import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { NotSavedNotice } from '@/components/ui/not-saved-notice';
import { SaveCancelButtons } from '@/components/ui/save-cancel-buttons';
import { saveErrors } from '@/components/ui/save-errors';
import { AppText } from '@/components/ui/text';
import type { DesignNumberKey } from './design-fields';
import { splitApiErrors, validateDesign, type DesignFormValues, type FieldErrors, type ValidDesign } from './design-form-model';
import { EndsSection } from './design-ends-section';
import { GrowerSection, LegSection, OperatingSection, SearchSection } from './design-form-sections';
import { QuickEstimate } from './quick-estimate';

export type DesignFormProps = {
  initial: DesignFormValues;
  submitLabel: string;
  pending: boolean;
  /** The last failed save: field errors land beside their fields. */
  error: Error | null;
  onSubmit: (input: ValidDesign) => void;
  onCancel: () => void;
};

/**
 * Create or edit a leg design: checked here with the server's schema as
 * the physicist types (after a first attempt), the server's own verdict
 * (e.g. the engine refusing a bound outside a table) shown beside the field.
 */
export function DesignForm({ initial, submitLabel, pending, error, onSubmit, onCancel }: DesignFormProps) {
  const [values, setValues] = useState(initial);
  const [tried, setTried] = useState(false);
  const local = tried ? validateDesign(values) : null;
  const fromServer = saveErrors(error, splitApiErrors);
  const errors: FieldErrors = { ...fromServer.byField, ...(local && !local.ok ? local.errors : {}) };
  const onNumber = (field: DesignNumberKey, text: string) => setValues((v) => ({ ...v, numbers: { ...v.numbers, [field]: text } }));
  const onChange = (patch: Partial<DesignFormValues>) => setValues((v) => ({ ...v, ...patch }));
  const submit = () => {
    setTried(true);
    const result = validateDesign(values);
    if (result.ok) onSubmit(result.input);
  };
  const section = { values, errors, onNumber, onChange };
  const problemCount = Object.keys(errors).length;
  return (
    <View style={styles.form}>
      <LegSection {...section} />
      <OperatingSection {...section} />
      <EndsSection {...section} />
      <GrowerSection {...section} />
      <SearchSection {...section} />
      <QuickEstimate values={values} onInvalid={() => setTried(true)} />
      {fromServer.message ? <NotSavedNotice message={fromServer.message} details={fromServer.other} testID="form-server-error" /> : null}
      {problemCount > 0 && !fromServer.message ? (
        <AppText tone="danger" role="alert" testID="form-problem-count">
          {`${problemCount} ${problemCount === 1 ? 'field needs' : 'fields need'} attention before saving.`}
        </AppText>
      ) : null}
      <SaveCancelButtons label={submitLabel} pending={pending} onSave={submit} onCancel={onCancel} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg, maxWidth: 760, width: '100%' },
});
