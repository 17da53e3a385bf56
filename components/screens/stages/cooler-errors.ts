import type { z } from 'zod';
import { issuePath, wordIssue } from '@/shared/api/field-labels';
import { ApiError } from '@/components/api/client';
import type { FieldErrors } from '@/components/screens/modules/module-form-model';

/** One spelling for a field's place: "stages.1.couples" (the API may write "stages[1].couples"). */
export function fieldKey(path: string): string {
  return path.replace(/\[(\d+)\]/g, '.$1');
}

/** The contract schema's refusals, in the form's words, each under its field; the first per field wins. */
export function errorsFromIssues(issues: readonly z.core.$ZodIssue[], into: FieldErrors = {}): FieldErrors {
  for (const issue of issues) {
    const key = fieldKey(issuePath(issue.path)) || 'form';
    into[key] ??= wordIssue(issue);
  }
  return into;
}

/** The API's 400 field messages (already worded by its labels), keyed as the form keys them. */
export function serverFieldErrors(error: unknown): FieldErrors {
  return error instanceof ApiError ? Object.fromEntries(error.fieldErrors.map((f) => [fieldKey(f.field), f.message])) : {};
}
