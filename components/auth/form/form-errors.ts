import type { z } from 'zod';
import { ApiError } from '@/components/api/client';
import { labelOf, wordIssue } from '@/shared/api/field-labels';

/** Messages beside fields, and one for the whole form (e.g. "too many attempts"). */
export type FormErrors<F extends string> = {
  fields: Partial<Record<F, string>>;
  banner: string | null;
};

export function noErrors<F extends string>(): FormErrors<F> {
  return { fields: {}, banner: null };
}

export function hasErrors<F extends string>(errors: FormErrors<F>): boolean {
  return errors.banner !== null || Object.keys(errors.fields).length > 0;
}

/**
 * The API and the shared schemas name the field first, by its label or its
 * key ("Password must be at least 10 characters", "email is not a valid
 * address"); beside the field that reads better without it: "Must be at
 * least 10 characters.", "Not a valid address."
 */
export function fieldMessage(field: string, message: string): string {
  const name = [labelOf(field), field].find((n) => n !== undefined && message.startsWith(`${n} `));
  let trimmed = name ? message.slice(name.length + 1) : message;
  if (trimmed !== message && trimmed.startsWith('is ')) trimmed = trimmed.slice(3);
  const sentence = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(sentence) ? sentence : `${sentence}.`;
}

type Problem = { field: string; message: string };

/**
 * Problems of fields on the form go beside them; the rest become the banner
 * (`rest` decides its words: the problems themselves, or one summary).
 */
function collect<F extends string>(
  problems: readonly Problem[],
  fields: readonly F[],
  rest: (elsewhere: string[]) => string,
): FormErrors<F> {
  const errors = noErrors<F>();
  const elsewhere: string[] = [];
  for (const { field, message } of problems) {
    const known = fields.find((f) => f === field);
    if (known === undefined) elsewhere.push(fieldMessage(field, message));
    else errors.fields[known] ??= fieldMessage(field, message);
  }
  if (elsewhere.length > 0 || problems.length === 0) errors.banner = rest(elsewhere);
  return errors;
}

/** Checks the form against the shared request schema before anything is sent; null when fine. */
export function checkForm<F extends string>(
  schema: z.ZodType,
  values: Record<string, unknown>,
  fields: readonly F[],
): FormErrors<F> | null {
  const result = schema.safeParse(values);
  if (result.success) return null;
  const problems = result.error.issues.map((issue) => ({
    field: String(issue.path[0] ?? ''),
    message: wordIssue(issue),
  }));
  return collect(problems, fields, (elsewhere) => elsewhere.join(' ') || 'Check the form.');
}

/** An API failure, split into field messages and a banner (429, network, 409, …). */
export function errorsFrom<F extends string>(error: unknown, fields: readonly F[]): FormErrors<F> {
  if (error instanceof ApiError) {
    // A refused field the form does not show (e.g. the link's token) is said in its own words;
    // any other failure (409, 429, network) by the API's message for people.
    const ownWords = error.name === 'ValidationError';
    return collect(error.fieldErrors, fields, (elsewhere) =>
      ownWords && elsewhere.length > 0 ? elsewhere.join(' ') : error.message,
    );
  }
  return { fields: {}, banner: error instanceof Error ? error.message : 'Something went wrong.' };
}
