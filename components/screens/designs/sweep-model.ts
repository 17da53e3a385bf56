import { designInputSchema, type Design } from '@/shared/api/designs';
import { sweepRequestSchema, type SweepRequest } from '@/shared/api/runs';
import { formatSweepValue, type SweepParameter } from '../runs/run-format';
import { humanize, parseNumber, requestBody, valuesFromDesign } from './design-form-model';

export type SweepCheck = { ok: true; request: SweepRequest } | { ok: false; message: string };

/** "280, 290 300;310" → the numbers typed, in order ("1e19" and "1×10^19" too). */
export function parseValueList(text: string): number[] {
  return text
    .split(/[,;\s]+/)
    .filter((part) => part.length > 0)
    .map((part) => parseNumber(part) ?? Number.NaN);
}

/**
 * A sweep request checked before anything is queued: the list itself (2–40
 * finite values, no repeats), and every value put into the design and
 * checked with the design's own rules, so no run is launched only to fail.
 */
export function checkSweep(design: Design, parameter: SweepParameter, text: string): SweepCheck {
  const values = parseValueList(text);
  const bad = text.split(/[,;\s]+/).filter((p) => p.length > 0 && !Number.isFinite(parseNumber(p) ?? Number.NaN));
  if (bad.length > 0) return { ok: false, message: `Not a number: ${bad.slice(0, 3).join(', ')}` };
  const parsed = sweepRequestSchema.safeParse({ parameter, values });
  if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? 'Check the values' };
  if (new Set(values).size !== values.length) return { ok: false, message: 'Each value once: a repeated value would run the same case twice.' };
  const base = requestBody(valuesFromDesign(design));
  for (const value of values) {
    const check = designInputSchema.safeParse({ ...base, [parameter]: value });
    if (!check.success) {
      const issue = check.error.issues[0];
      const field = issue?.path.map(String).join('.') ?? parameter;
      return { ok: false, message: `At ${formatSweepValue(parameter, value)}: ${humanize(field, issue?.message ?? 'not allowed')}` };
    }
  }
  return { ok: true, request: parsed.data };
}
