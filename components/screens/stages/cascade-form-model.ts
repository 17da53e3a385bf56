import { cascadeInputSchema, type CascadeInput, type StageInput } from '@/shared/api/coolers';
import { formatForInput } from '@/components/format/number';
import { emptyLeg, legSourceFromText, legTextFrom, numberFromText, type FieldErrors, type LegText } from '@/components/screens/modules/module-form-model';
import { errorsFromIssues } from './cooler-errors';

/** Where a stage's couples come from: a p and an n leg, or both legs of a finished matched-couple run. */
export type StageText = { couples: string; source: 'legs' | 'couple'; p: LegText; n: LegText; coupleRunId: string; interfaceResistance: string };

export type CascadeText = {
  name: string;
  notes: string;
  hotSide: string;
  objective: 'maxDeltaT' | 'minPower';
  /** On the coldest stage, typed in mW (a detector's load); the API takes W. */
  heatLoadMw: string;
  coldSide: string;
  wiring: 'series' | 'separate';
  /** Optimise the couple counts within `totalCouples`, or keep the counts typed per stage. */
  countsOptimised: boolean;
  totalCouples: string;
  starts: string;
  /** Coldest first. */
  stages: StageText[];
};

/** Stages a cascade may have (the engine's and the API's limit). */
export const maxStages = 4;

export const emptyStage = (couples: string): StageText => ({ couples, source: 'legs', p: emptyLeg('family'), n: emptyLeg('family'), coupleRunId: '', interfaceResistance: '0' });

export const defaultCascadeText = (): CascadeText => ({
  name: '',
  notes: '',
  hotSide: '300',
  objective: 'maxDeltaT',
  heatLoadMw: '5',
  coldSide: '',
  wiring: 'series',
  countsOptimised: false,
  totalCouples: '120',
  starts: '4',
  stages: [emptyStage('8'), emptyStage('32')],
});

/**
 * One more stage at the hot end (the bottom of the pyramid): it carries the
 * heat of every stage above it, so it starts with three times the couples
 * of the stage it sits under, and the same legs.
 */
export function withStageAdded(t: CascadeText): CascadeText {
  if (t.stages.length >= maxStages) return t;
  const last = t.stages[t.stages.length - 1] ?? emptyStage('4');
  const couples = Number(last.couples);
  return { ...t, stages: [...t.stages, { ...last, couples: Number.isFinite(couples) && couples > 0 ? String(Math.round(couples * 3)) : last.couples }] };
}

export function withStageRemoved(t: CascadeText, index: number): CascadeText {
  return t.stages.length <= 1 ? t : { ...t, stages: t.stages.filter((_, i) => i !== index) };
}

function stageFrom(errors: FieldErrors, s: StageText, i: number) {
  const at = `stages.${i}`;
  const couples = numberFromText(errors, `${at}.couples`, s.couples, `Stage ${i + 1}: couples`);
  const interfaceResistance = numberFromText(errors, `${at}.interfaceResistance`, s.interfaceResistance, `Stage ${i + 1}: interface resistance (K/W)`, true);
  if (s.source === 'couple') {
    if (s.coupleRunId === '') errors[`${at}.source.runId`] = `Stage ${i + 1}: pick a finished matched-couple run`;
    return { couples, interfaceResistance, source: { kind: 'couple' as const, runId: s.coupleRunId } };
  }
  const legErrors: FieldErrors = {};
  const p = legSourceFromText(legErrors, `${at}.source.p`, 'p', s.p);
  const n = legSourceFromText(legErrors, `${at}.source.n`, 'n', s.n);
  // Every stage has a p and an n leg: the message says which stage's, wherever it is read.
  for (const [key, message] of Object.entries(legErrors)) errors[key] = `Stage ${i + 1}, ${message}`;
  // A stage's legs are fixed legs: the form offers no leg design here.
  const fixed = p && n && p.kind !== 'design' && n.kind !== 'design' ? { kind: 'legs' as const, p, n } : null;
  return { couples, interfaceResistance, source: fixed };
}

/**
 * The form's text as a cascade input, checked by the API's own schema so
 * the form refuses what the API would; each message sits under its field
 * (keys as the API names them, e.g. `stages.1.couples`).
 */
export function cascadeInputFrom(t: CascadeText): { input: CascadeInput | null; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const hotSide = numberFromText(errors, 'hotSide', t.hotSide, 'Hot-side temperature Th (K)');
  const heatLoadMw = numberFromText(errors, 'heatLoad', t.heatLoadMw, 'Heat load Qc (mW)');
  const coldSide = t.objective === 'minPower' ? numberFromText(errors, 'coldSide', t.coldSide, 'Cold-side target Tc (K)') : undefined;
  const starts = numberFromText(errors, 'starts', t.starts, 'Search starts');
  const total = t.countsOptimised ? numberFromText(errors, 'couplesLimit.total', t.totalCouples, 'Total couples') : undefined;
  const stages = t.stages.map((s, i) => stageFrom(errors, s, i));
  if (Object.keys(errors).length > 0 || t.name.trim() === '') {
    if (t.name.trim() === '') errors.name = 'Name is required';
    return { input: null, errors };
  }
  const candidate = {
    kind: 'cascade' as const,
    name: t.name.trim(),
    notes: t.notes.trim(),
    hotSide,
    objective: t.objective,
    heatLoad: (heatLoadMw ?? 0) / 1000,
    ...(coldSide === undefined ? {} : { coldSide }),
    wiring: t.wiring,
    stages: stages.map((s) => ({ couples: s.couples, source: s.source, interfaceResistance: s.interfaceResistance ?? 0 })),
    couplesLimit: total === undefined ? null : { kind: 'total' as const, total },
    starts,
  };
  const parsed = cascadeInputSchema.safeParse(candidate);
  if (!parsed.success) return { input: null, errors: errorsFromIssues(parsed.error.issues) };
  return { input: candidate as CascadeInput, errors: {} };
}

function stageText(s: StageInput): StageText {
  const base = { couples: String(s.couples), interfaceResistance: formatForInput(s.interfaceResistance ?? 0) };
  if (s.source.kind === 'couple') return { ...emptyStage('1'), ...base, source: 'couple', coupleRunId: s.source.runId };
  return { ...emptyStage('1'), ...base, source: 'legs', p: legTextFrom(s.source.p), n: legTextFrom(s.source.n) };
}

/** A saved cascade back into the form's text. */
export function cascadeTextFrom(input: CascadeInput): CascadeText {
  const limit = input.couplesLimit ?? null;
  return {
    name: input.name,
    notes: input.notes ?? '',
    hotSide: formatForInput(input.hotSide),
    objective: input.objective ?? 'maxDeltaT',
    heatLoadMw: formatForInput((input.heatLoad ?? 0) * 1000),
    coldSide: formatForInput(input.coldSide),
    wiring: input.wiring ?? 'series',
    countsOptimised: limit !== null,
    totalCouples: limit?.kind === 'total' ? String(limit.total) : defaultCascadeText().totalCouples,
    starts: String(input.starts ?? 4),
    stages: input.stages.map(stageText),
  };
}
