import type { z } from 'zod';
import { createFamilyRequestSchema, type FamilyVersion } from '@/shared/api/families';
import type { FieldError } from '@/shared/api/errors';
import type { MaterialInput } from '@/shared/engine';
import { splitFieldErrors, type FieldErrors, type SplitErrors } from '@/components/ui/save-errors';
import { bandParameters, minorityParameters, type BandNumberKey, type MinorityKey } from '../band-parameters';
import { formatForInput } from '@/components/format/number';
import { labelOf, wordIssue, wordMessage } from '@/shared/api/field-labels';

/** What the form holds: text as typed, so a half-typed "1e" is not lost. */
export type FamilyFormValues = {
  name: string;
  summary: string;
  source: string;
  carrier: 'p' | 'n';
  numbers: Record<BandNumberKey, string>;
  /** Two bands (a minority band across a gap) or one. */
  twoBands: boolean;
  minority: Record<MinorityKey, string>;
};

export type { FieldErrors };

export type ValidRequest = z.output<typeof createFamilyRequestSchema>;
export type Validation = { ok: true; request: ValidRequest } | { ok: false; errors: FieldErrors };

export function emptyBandValues(): FamilyFormValues {
  return {
    name: '',
    summary: '',
    source: '',
    carrier: 'p',
    numbers: {
      effectiveMass: '',
      mobility300: '',
      mobilityExponent: '-1.5',
      latticeKappa300: '',
      latticeKappaExponent: '-1',
    },
    twoBands: false,
    minority: { bandGap: '', bandGapSlope: '', effectiveMass: '', mobility300: '', mobilityExponent: '-1.5' },
  };
}

/** The form filled from a stored version (band numbers only for band models). */
export function valuesFromVersion(name: string, version: Pick<FamilyVersion, 'definition' | 'summary' | 'source'>): FamilyFormValues {
  const values = { ...emptyBandValues(), name, summary: version.summary, source: version.source };
  const definition = version.definition;
  if (definition.kind !== 'band') return values;
  const numbers = { ...values.numbers };
  for (const p of bandParameters) numbers[p.key] = formatForInput(definition[p.key]);
  const stored = definition.minority;
  if (!stored) return { ...values, carrier: definition.carrier, numbers };
  const minority = { ...values.minority };
  for (const p of minorityParameters) minority[p.key] = formatForInput(stored[p.key]);
  return { ...values, carrier: definition.carrier, numbers, twoBands: true, minority };
}

/** "" → missing (the schema says "is required"); anything else a number, NaN if it is not one. */
function parseNumber(text: string): number | undefined {
  const trimmed = text.trim().replace(/\u2212/g, '-');
  if (trimmed === '') return undefined;
  return Number(trimmed.replace(',', '.'));
}

function bandDefinition(values: FamilyFormValues): Record<string, unknown> {
  const definition: Record<string, unknown> = { kind: 'band', carrier: values.carrier };
  for (const p of bandParameters) definition[p.key] = parseNumber(values.numbers[p.key]);
  if (values.twoBands) definition.minority = Object.fromEntries(minorityParameters.map((p) => [p.key, parseNumber(values.minority[p.key])]));
  return definition;
}

/** The form's fields: the provenance texts, the carrier and the band numbers of both bands. */
const formFieldList = [
  'name',
  'summary',
  'source',
  'definition.carrier',
  ...bandParameters.map((p) => `definition.${p.key}`),
  'definition.minority',
  ...minorityParameters.map((p) => `definition.minority.${p.key}`),
];

/** The label a field has on screen ("Effective mass"), or its path when it has none. */
export function fieldLabel(field: string): string {
  return labelOf(field) ?? field;
}

/** Messages name fields by their labels (shared/api/field-labels.ts), not by their keys. */
export const humanize = wordMessage;

/**
 * Checks the form with the same schema the server uses. `fixedDefinition`
 * (measured or constant families) is sent unchanged: only the texts are edited.
 */
export function validate(values: FamilyFormValues, fixedDefinition?: MaterialInput): Validation {
  const body = {
    name: values.name,
    summary: values.summary,
    source: values.source,
    definition: fixedDefinition ?? bandDefinition(values),
  };
  const parsed = createFamilyRequestSchema.safeParse(body);
  if (parsed.success) return { ok: true, request: parsed.data };
  const errors: FieldErrors = {};
  for (const issue of parsed.error.issues) {
    const field = issue.path.map(String).join('.');
    errors[field] ??= wordIssue(issue);
  }
  return { ok: false, errors };
}

/** Fields the form shows; API errors on anything else are listed above the buttons. */
export const formFields = new Set(formFieldList);

export function splitApiErrors(fieldErrors: FieldError[]): SplitErrors {
  return splitFieldErrors(fieldErrors, formFields, humanize);
}
