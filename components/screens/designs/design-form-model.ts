import type { z } from 'zod';
import { designInputSchema, type Design, type Objective, type ParasiticKind } from '@/shared/api/designs';
import type { FieldError } from '@/shared/api/errors';
import { splitFieldErrors, type FieldErrors, type SplitErrors } from '@/components/ui/save-errors';
import { designFieldInfo, type DesignNumberKey } from './design-fields';
import { formatForInput } from '@/components/format/number';
import { labelOf, wordIssue, wordMessage } from '@/shared/api/field-labels';

/** What the form holds: numbers as typed, so a half-typed "1e" is not lost. */
export type DesignFormValues = {
  name: string;
  notes: string;
  familyId: string;
  /** The family version to keep (editing); absent = the family's current version when saved. */
  familyVersion?: number;
  objective: Objective;
  monotone: boolean;
  parasitic: ParasiticKind;
  numbers: Record<DesignNumberKey, string>;
};

export type { FieldErrors };
export type ValidDesign = z.output<typeof designInputSchema>;
export type DesignValidation = { ok: true; input: ValidDesign } | { ok: false; errors: FieldErrors };

/** A new design: the demo lab's usual detector leg, so the form opens ready to estimate. */
export function emptyDesignValues(familyId = ''): DesignFormValues {
  return {
    name: '',
    notes: '',
    familyId,
    objective: 'maxDeltaT',
    monotone: false,
    parasitic: 'none',
    numbers: {
      lengthMm: '1.5',
      areaMm2: '1',
      hotSide: '300',
      heatLoad: '0',
      coldSide: '',
      minPerCm3: '1e18',
      maxPerCm3: '1e20',
      controlPoints: '11',
      starts: '16',
      minZoneMm: '0',
      coldContactMicroOhmCm2: '0',
      hotContactMicroOhmCm2: '0',
      parasiticLoadW: '',
      emissivity: '',
      surroundingsK: '',
    },
  };
}

const text = formatForInput;

/** The form filled from a stored design (editing keeps its family version). */
export function valuesFromDesign(d: Design): DesignFormValues {
  return {
    name: d.name,
    notes: d.notes,
    familyId: d.familyId,
    familyVersion: d.familyVersion,
    objective: d.objective,
    monotone: d.monotone,
    parasitic: d.parasitic,
    numbers: {
      lengthMm: text(d.lengthMm),
      areaMm2: text(d.areaMm2),
      hotSide: text(d.hotSide),
      heatLoad: text(d.heatLoad),
      coldSide: text(d.coldSide),
      minPerCm3: text(d.minPerCm3),
      maxPerCm3: text(d.maxPerCm3),
      controlPoints: text(d.controlPoints),
      starts: text(d.starts),
      minZoneMm: text(d.minZoneMm),
      coldContactMicroOhmCm2: text(d.coldContactMicroOhmCm2),
      hotContactMicroOhmCm2: text(d.hotContactMicroOhmCm2),
      // Only the chosen kind's numbers are stored meaningfully; the others start empty.
      parasiticLoadW: d.parasitic === 'fixed' ? text(d.parasiticLoadW) : '',
      emissivity: d.parasitic === 'radiation' ? text(d.emissivity) : '',
      surroundingsK: d.parasitic === 'radiation' ? text(d.surroundingsK) : '',
    },
  };
}

/**
 * "" → absent (a default applies, or the schema says what is missing);
 * otherwise a number, NaN when it is not one. Accepts "1e19", "1.5×10^19",
 * a decimal comma and the typographic minus.
 */
export function parseNumber(raw: string): number | undefined {
  const trimmed = raw.trim().replace(/\u2212/g, '-').replace(',', '.');
  if (trimmed === '') return undefined;
  const power = /^([-+]?\d*\.?\d+)\s*[×x*]\s*10\s*\^\s*([-+]?\d+)$/i.exec(trimmed);
  return Number(power ? `${power[1]}e${power[2]}` : trimmed);
}

/** The request body: fields an objective does not use are left out. */
export function requestBody(values: DesignFormValues): Record<string, unknown> {
  const n = (key: DesignNumberKey) => parseNumber(values.numbers[key]);
  return {
    name: values.name,
    notes: values.notes,
    familyId: values.familyId,
    ...(values.familyVersion === undefined ? {} : { familyVersion: values.familyVersion }),
    objective: values.objective,
    lengthMm: n('lengthMm'),
    areaMm2: n('areaMm2'),
    hotSide: n('hotSide'),
    ...(values.objective === 'maxHeatLoad' ? {} : { heatLoad: n('heatLoad') }),
    ...(values.objective === 'maxDeltaT' ? {} : { coldSide: n('coldSide') }),
    minPerCm3: n('minPerCm3'),
    maxPerCm3: n('maxPerCm3'),
    controlPoints: n('controlPoints'),
    monotone: values.monotone,
    starts: n('starts'),
    minZoneMm: n('minZoneMm'),
    coldContactMicroOhmCm2: n('coldContactMicroOhmCm2'),
    hotContactMicroOhmCm2: n('hotContactMicroOhmCm2'),
    parasitic: values.parasitic,
    ...(values.parasitic === 'fixed' ? { parasiticLoadW: n('parasiticLoadW') } : {}),
    ...(values.parasitic === 'radiation' ? { emissivity: n('emissivity'), surroundingsK: n('surroundingsK') } : {}),
  };
}

/**
 * Messages name fields by their labels, not their keys ("lengthMm must…",
 * the engine's "bounds.minPerCm3: is below…"): the one wording of
 * shared/api/field-labels.ts.
 */
export const humanize = wordMessage;

const familyMissing = 'Choose a material family';

/** Checks the form with the schema the server uses; a missing number says "is required". */
export function validateDesign(values: DesignFormValues): DesignValidation {
  const body = requestBody(values);
  const parsed = designInputSchema.safeParse(body);
  if (parsed.success) return { ok: true, input: parsed.data };
  const errors: FieldErrors = {};
  for (const issue of parsed.error.issues) {
    const field = issue.path.map(String).join('.');
    if (errors[field]) continue;
    if (field === 'familyId') errors[field] = familyMissing;
    else if (body[field] === undefined && issue.code === 'invalid_type') errors[field] = `${labelOf(field) ?? field} is required`;
    else errors[field] = wordIssue(issue);
  }
  return { ok: false, errors };
}

/** Fields the form shows; API errors on anything else are listed above the buttons. */
const formFields = new Set(Object.keys(designFieldInfo));

export function splitApiErrors(fieldErrors: FieldError[]): SplitErrors {
  return splitFieldErrors(fieldErrors, formFields, humanize);
}
