import { useState } from 'react';
import type { z } from 'zod';
import { checkForm, errorsFrom, noErrors, type FormErrors } from './form-errors';

/**
 * Values and errors of a small account form. `check` validates against the
 * shared request schema before sending; `fail` shows what the API refused.
 * Editing a field clears its message.
 */
export function useAccountForm<F extends string>(fields: readonly F[], initial: Record<F, string>) {
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<FormErrors<F>>(noErrors);

  const set = (field: F) => (text: string) => {
    setValues((current) => ({ ...current, [field]: text }));
    setErrors((current) => {
      if (current.fields[field] === undefined) return current;
      const rest = { ...current.fields };
      delete rest[field];
      return { ...current, fields: rest };
    });
  };

  const check = (schema: z.ZodType, extra: Record<string, unknown> = {}): boolean => {
    const found = checkForm(schema, { ...values, ...extra }, fields);
    setErrors(found ?? noErrors());
    return found === null;
  };

  /** What an AccountField needs to show and edit one field: `<AccountField {...form.field('email')} … />`. */
  const field = (name: F) => ({ id: name, value: values[name], onChangeText: set(name), error: errors.fields[name] });

  const fail = (error: unknown) => setErrors(errorsFrom(error, fields));
  const reset = () => setErrors(noErrors());

  return { values, errors, set, field, check, fail, reset };
}
