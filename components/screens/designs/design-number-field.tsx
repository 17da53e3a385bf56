import { TextField } from '@/components/ui/text-field';
import { designFieldInfo, type DesignNumberKey } from './design-fields';
import type { DesignFormValues, FieldErrors } from './design-form-model';

export type DesignNumberFieldProps = {
  field: DesignNumberKey;
  values: DesignFormValues;
  errors: FieldErrors;
  onNumber: (field: DesignNumberKey, text: string) => void;
  required?: boolean;
};

/** One number of the design with its label, unit and one-line explanation. */
export function DesignNumberField({ field, values, errors, onNumber, required = false }: DesignNumberFieldProps) {
  const info = designFieldInfo[field];
  return (
    <TextField
      id={field}
      label={info.label}
      unit={info.unit}
      help={info.help}
      placeholder={info.placeholder}
      value={values.numbers[field]}
      onChangeText={(text) => onNumber(field, text)}
      error={errors[field]}
      required={required}
      keyboardType="numbers-and-punctuation"
      mono
    />
  );
}
