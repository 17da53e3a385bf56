import type { FieldError } from '@/shared/api/errors';
import { fieldSentence } from '@/shared/api/field-labels';
import { ApiError } from '@/components/api/client';

/** Field path (as the API names it, e.g. `definition.effectiveMass`) → message beside that field. */
export type FieldErrors = Partial<Record<string, string>>;

/** A refused save sorted for a form: messages beside its fields, and the problems it has no field for. */
export type SplitErrors = { byField: FieldErrors; other: string[] };

/**
 * A field the form shows gets the first message about it, in the form's
 * words (`humanize`); anything else is listed as a sentence naming its field by its label.
 */
export function splitFieldErrors(
  fieldErrors: readonly FieldError[],
  shown: ReadonlySet<string>,
  humanize: (field: string, message: string) => string,
): SplitErrors {
  const byField: FieldErrors = {};
  const other: string[] = [];
  for (const e of fieldErrors) {
    if (shown.has(e.field)) byField[e.field] ??= humanize(e.field, e.message);
    else other.push(fieldSentence(e.field, e.message));
  }
  return { byField, other };
}

/** The last failed save, for a form: its field errors split by `split`, and the message for people. */
export function saveErrors(error: Error | null, split: (fieldErrors: FieldError[]) => SplitErrors): SplitErrors & { message?: string } {
  if (!error) return { byField: {}, other: [] };
  if (!(error instanceof ApiError)) return { byField: {}, other: [], message: error.message };
  return { ...split(error.fieldErrors), message: error.message };
}
