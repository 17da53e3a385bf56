import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { MaterialInput } from '@/shared/engine';
import { spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { NotSavedNotice } from '@/components/ui/not-saved-notice';
import { SaveCancelButtons } from '@/components/ui/save-cancel-buttons';
import { saveErrors } from '@/components/ui/save-errors';
import { AppText } from '@/components/ui/text';
import { BandFields } from './band-fields';
import {
  fieldLabel,
  splitApiErrors,
  validate,
  type FamilyFormValues,
  type FieldErrors,
  type ValidRequest,
} from './family-form-model';
import { ProvenanceFields } from './provenance-fields';

export type FamilyFormProps = {
  initial: FamilyFormValues;
  /** Measured and constant families: their definition is kept, only the texts change. */
  fixedDefinition?: MaterialInput;
  submitLabel: string;
  /** Above the buttons, e.g. what saving does to versions. */
  notice?: ReactNode;
  pending: boolean;
  /** The last failed save (field errors land beside their fields). */
  error: Error | null;
  onSubmit: (request: ValidRequest) => void;
  onCancel: () => void;
};

/** Create or edit a family: checked here with the server's schema, then sent. */
export function FamilyForm(props: FamilyFormProps) {
  const { initial, fixedDefinition, submitLabel, notice, pending, error, onSubmit, onCancel } = props;
  const [values, setValues] = useState(initial);
  const [tried, setTried] = useState(false);
  // After a first attempt, errors follow the typing; the server's until the next save.
  const local = tried ? validate(values, fixedDefinition) : null;
  const fromServer = saveErrors(error, splitApiErrors);
  const errors: FieldErrors = { ...fromServer.byField, ...(local && !local.ok ? local.errors : {}) };
  const submit = () => {
    setTried(true);
    const result = validate(values, fixedDefinition);
    if (result.ok) onSubmit(result.request);
  };
  const problems = Object.keys(errors).map(fieldLabel);
  return (
    <View style={styles.form}>
      {fixedDefinition ? null : (
        <Section title="Band model" hint="Parabolic bands with acoustic-phonon scattering: the majority band, and optionally a minority band across a gap.">
          <BandFields
            values={values}
            errors={errors}
            onCarrier={(carrier) => setValues((v) => ({ ...v, carrier }))}
            onNumber={(key, text) => setValues((v) => ({ ...v, numbers: { ...v.numbers, [key]: text } }))}
            onTwoBands={(twoBands) => setValues((v) => ({ ...v, twoBands }))}
            onMinority={(key, text) => setValues((v) => ({ ...v, minority: { ...v.minority, [key]: text } }))}
          />
        </Section>
      )}
      <Section title="Name and provenance">
        <ProvenanceFields values={values} errors={errors} onChange={(field, text) => setValues((v) => ({ ...v, [field]: text }))} />
      </Section>
      {notice}
      {fromServer.message ? <NotSavedNotice message={fromServer.message} details={fromServer.other} testID="form-server-error" /> : null}
      {problems.length > 0 && !fromServer.message ? (
        <AppText tone="danger" role="alert" testID="form-problems">
          {`Fix before saving: ${problems.join(', ')}.`}
        </AppText>
      ) : null}
      <SaveCancelButtons label={submitLabel} pending={pending} onSave={submit} onCancel={onCancel} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg, maxWidth: 720, width: '100%' },
});
