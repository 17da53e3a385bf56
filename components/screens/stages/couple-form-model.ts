import type { Objective } from '@/shared/api/designs';
import { coupleInputSchema, type CoupleInput } from '@/shared/api/coolers';
import { formatForInput } from '@/components/format/number';
import { emptyLeg, legSourceFromText, legTextFrom, numberFromText, type FieldErrors, type LegText } from '@/components/screens/modules/module-form-model';
import { errorsFromIssues } from './cooler-errors';

export type CoupleText = {
  name: string;
  notes: string;
  p: LegText;
  n: LegText;
  hotSide: string;
  objective: Objective;
  /** Per couple, typed in mW; the API takes W. Held by the ΔT and COP objectives. */
  heatLoadMw: string;
  /** The cold side the heat-load and COP objectives hold. */
  coldSide: string;
  /** Let the optimiser choose A_n / A_p, or hold the typed ratio. */
  areaRatioFree: boolean;
  areaRatio: string;
  starts: string;
};

export const defaultCoupleText = (): CoupleText => ({
  name: '',
  notes: '',
  p: emptyLeg('design'),
  n: emptyLeg('design'),
  hotSide: '300',
  objective: 'maxDeltaT',
  heatLoadMw: '0',
  coldSide: '250',
  areaRatioFree: true,
  areaRatio: '1',
  starts: '8',
});

/** The objective's own conditions, as for a leg design: ΔT at a heat load, the largest heat load at a cold side, the best COP at both. */
export const usesColdSide = (o: Objective) => o !== 'maxDeltaT';
export const usesHeatLoad = (o: Objective) => o !== 'maxHeatLoad';

/** The form's text as a couple input, checked by the API's schema; messages keyed as the API names fields. */
export function coupleInputFrom(t: CoupleText): { input: CoupleInput | null; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const p = legSourceFromText(errors, 'p', 'p', t.p);
  const n = legSourceFromText(errors, 'n', 'n', t.n);
  const hotSide = numberFromText(errors, 'hotSide', t.hotSide, 'Hot-side temperature Th (K)');
  const heatLoadMw = !usesHeatLoad(t.objective) ? 0 : numberFromText(errors, 'heatLoad', t.heatLoadMw, 'Heat load Qc per couple (mW)');
  const coldSide = usesColdSide(t.objective) ? numberFromText(errors, 'coldSide', t.coldSide, 'Cold-side target Tc (K)') : undefined;
  const areaRatio = t.areaRatioFree ? undefined : numberFromText(errors, 'areaRatio', t.areaRatio, 'Area ratio A_n / A_p');
  const starts = numberFromText(errors, 'starts', t.starts, 'Search starts');
  if (t.name.trim() === '') errors.name = 'Name is required';
  if (Object.keys(errors).length > 0) return { input: null, errors };
  const candidate = {
    kind: 'couple' as const,
    name: t.name.trim(),
    notes: t.notes.trim(),
    p,
    n,
    hotSide,
    objective: t.objective,
    heatLoad: (heatLoadMw ?? 0) / 1000,
    ...(coldSide === undefined ? {} : { coldSide }),
    ...(areaRatio === undefined ? {} : { areaRatio }),
    starts,
  };
  const parsed = coupleInputSchema.safeParse(candidate);
  if (!parsed.success) return { input: null, errors: errorsFromIssues(parsed.error.issues) };
  return { input: candidate as CoupleInput, errors: {} };
}

/** A saved couple back into the form's text. */
export function coupleTextFrom(input: CoupleInput): CoupleText {
  const d = defaultCoupleText();
  return {
    name: input.name,
    notes: input.notes ?? '',
    p: legTextFrom(input.p),
    n: legTextFrom(input.n),
    hotSide: formatForInput(input.hotSide),
    objective: input.objective ?? 'maxDeltaT',
    heatLoadMw: formatForInput((input.heatLoad ?? 0) * 1000),
    coldSide: input.coldSide === undefined ? d.coldSide : formatForInput(input.coldSide),
    areaRatioFree: input.areaRatio === undefined,
    areaRatio: input.areaRatio === undefined ? d.areaRatio : formatForInput(input.areaRatio),
    starts: String(input.starts ?? 8),
  };
}
