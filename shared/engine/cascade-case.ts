/**
 * A cascade case (`leg cascade FILE`, and the case_json of a cascade run):
 * the zod schema shared by server and client, and the checks that turn JSON
 * into a CheckedCascadeCase or a CaseError naming the field by its path
 * (`stages[1].couples`). Each stage's legs are legs exactly as in the
 * `curves` and `module` commands, checked by the same code (device-case.ts).
 */
import { z } from 'zod';
import type { CascadeStage } from './cascade';
import { CaseError } from './case-error';
import { caseSchema } from './case-schema';
import { asObject, checkLeg, count, firstIssue, legDefinitionSchema, positiveUpTo } from './device-case';
import type { LegDefinition } from './module';

const shape = caseSchema.shape;
export const MAX_STAGES = 4;
export const DEFAULT_CASCADE_CURVE_POINTS = 12;

const stageLeg = (side: 'p' | 'n') =>
  z.strictObject(legDefinitionSchema.shape, {
    error: (issue) =>
      issue.input === undefined
        ? `${side} is required: the stage's ${side}-type leg, {length, area, material, doping} or {length, area, segments}`
        : `${side} must be an object: {length, area, material, doping} or {length, area, segments}`,
  });

const stageSchema = z.strictObject(
  {
    couples: z
      .number({ error: (issue) => (issue.input === undefined ? 'couples is required: the number of couples in this stage' : 'couples must be a whole number') })
      .int({ error: 'couples must be a whole number' })
      .min(1, { error: 'a stage needs at least 1 couple: a stage of 0 couples pumps nothing, so the warmer stages would have no load to carry' })
      .max(100000, { error: 'couples must be at most 100000' }),
    p: stageLeg('p'),
    n: stageLeg('n'),
    interfaceResistance: z
      .number({ error: 'interfaceResistance must be a finite number' })
      .min(0, { error: 'interfaceResistance must not be negative' })
      .max(1e3, { error: 'interfaceResistance above 1000 K/W is implausible: it is the thermal resistance in K/W from this stage to the next warmer one (or the sink), ~0.01–1 K/W for a ceramic plate and grease' })
      .optional(),
  },
  { error: 'each stage must be an object: {couples, p, n, interfaceResistance}' },
);

const currentSchema = positiveUpTo('current', 1e4, 'the current is in amperes');

export const cascadeCaseSchema = z.strictObject({
  description: shape.description,
  hotSide: shape.hotSide,
  /** W drawn from the load by the coldest stage; default 0 for maxDeltaT. */
  heatLoad: z.number({ error: 'heatLoad must be a finite number' }).min(0, { error: 'heatLoad must not be negative' }).max(1e4, { error: 'heatLoad above 1e4 W is implausible: it is in watts' }).optional(),
  coldSide: shape.coldSide,
  stages: z
    .array(stageSchema, { error: 'stages must be a list of stages, coldest first: [{couples, p, n, interfaceResistance}]' })
    .min(1, { error: `a cascade needs 1 to ${MAX_STAGES} stages, coldest first` })
    .max(MAX_STAGES, { error: `a cascade has at most ${MAX_STAGES} stages` }),
  wiring: z.enum(['series', 'separate'], { error: 'wiring must be "series" (one current through every stage) or "separate" (one supply per stage)' }).optional(),
  current: currentSchema.optional(),
  currents: z.array(currentSchema.nullable(), { error: 'currents must be a list, one current [A] per stage (null: optimise it)' }).optional(),
  objective: z.enum(['maxDeltaT', 'minPower'], { error: 'objective must be "maxDeltaT" or "minPower"' }).optional(),
  optimizeCouples: z
    .union([
      z.strictObject({ total: count('total', 1, 1e6) }),
      z.strictObject({ baseArea: positiveUpTo('baseArea', 1, 'it is in m² (1 cm² = 1e-4 m²)') }),
    ], { error: 'optimizeCouples must be {total} (couples in all stages) or {baseArea} (m², the hottest stage’s leg cross-section)' })
    .optional(),
  curvePoints: count('curvePoints', 2, 200).optional(),
});

export type CascadeCaseInput = z.infer<typeof cascadeCaseSchema>;

/** How the couple counts are optimised: none, a total over the stages, or the hottest stage's leg area. */
export type CouplesLimit = { total: number } | { baseArea: number } | null;

export type CheckedCascadeCase = {
  hotSide: number;
  objective: 'maxDeltaT' | 'minPower';
  wiring: 'series' | 'separate';
  /** W on the coldest stage (0 by default for maxDeltaT). */
  heatLoad: number;
  /** The load's temperature, for minPower; null for maxDeltaT. */
  coldSide: number | null;
  /** Coldest first; couples are the given counts (the optimiser's start when optimizeCouples is set). */
  stages: CascadeStage[];
  /** Fixed currents [A], null where optimised: one for series wiring, one per stage for separate. */
  currents: (number | null)[];
  optimizeCouples: CouplesLimit;
  curvePoints: number;
};

/** One couple's leg cross-section A_p + A_n of a stage [m²]. */
export const coupleArea = (s: CascadeStage) => s.p.area + s.n.area;

function checkCarriers(p: LegDefinition, n: LegDefinition, at: string) {
  if (p.leg.kind === 'family' ? p.leg.family.sign !== 1 : p.leg.segments[0].seebeck < 0) throw new CaseError(`${at}.p.${p.leg.kind === 'family' ? 'material' : 'segments'}`, 'the p leg must be p-type (positive Seebeck coefficient)');
  if (n.leg.kind === 'family' ? n.leg.family.sign !== -1 : n.leg.segments[0].seebeck > 0) throw new CaseError(`${at}.n.${n.leg.kind === 'family' ? 'material' : 'segments'}`, 'the n leg must be n-type (negative Seebeck coefficient)');
}

/** Validate a cascade case. */
export function parseCascadeCase(json: unknown): CheckedCascadeCase {
  const parsed = cascadeCaseSchema.safeParse(asObject(json));
  if (!parsed.success) throw firstIssue(parsed.error);
  const input = parsed.data;
  const objective = input.objective ?? 'maxDeltaT';
  const wiring = input.wiring ?? 'series';
  const n = input.stages.length;
  if (objective === 'maxDeltaT' && input.coldSide !== undefined) throw new CaseError('coldSide', 'maxDeltaT finds the cold side: give heatLoad (W, default 0), or set objective to "minPower" to hold this cold side with the least power');
  if (objective === 'minPower') {
    if (input.coldSide === undefined) throw new CaseError('coldSide', 'is required for minPower: the temperature the coldest stage must hold [K]');
    if (input.heatLoad === undefined) throw new CaseError('heatLoad', 'is required for minPower: the heat the coldest stage must draw at coldSide [W]');
    if (!(input.coldSide < input.hotSide)) throw new CaseError('coldSide', `must be below hotSide (${input.hotSide} K): a cascade cools`);
  }
  let currents: (number | null)[];
  if (wiring === 'series') {
    if (input.currents !== undefined) throw new CaseError('currents', 'is for separate wiring; with series wiring give one current (or none to optimise it)');
    currents = [input.current ?? null];
  } else {
    if (input.current !== undefined) throw new CaseError('current', 'is for series wiring; with separate wiring give currents, one per stage (null to optimise one)');
    currents = input.currents ?? input.stages.map(() => null);
    if (currents.length !== n) throw new CaseError('currents', `give one current per stage: ${n} stages, ${currents.length} current${currents.length === 1 ? '' : 's'}`);
  }
  if (objective === 'minPower' && currents.every((c) => c !== null)) {
    throw new CaseError(wiring === 'series' ? 'current' : 'currents', 'minPower needs a current to optimise (leave it out, or null): at fixed currents the heat held at coldSide follows from them');
  }
  const coldSide = objective === 'minPower' ? (input.coldSide as number) : undefined;
  const coldField = objective === 'minPower' ? 'coldSide' : 'hotSide';
  const stages = input.stages.map((s, k): CascadeStage => {
    const at = `stages[${k}]`;
    for (const side of ['p', 'n'] as const) {
      const leg = s[side];
      if (leg.segments && leg.material) throw new CaseError(`${at}.${side}.segments`, 'give either segments or a material, not both');
      if (!leg.segments && !leg.material) throw new CaseError(`${at}.${side}.material`, 'give either segments or a material');
    }
    const p = checkLeg(s.p, s.p.area, input.hotSide, coldSide, `${at}.p`, coldField);
    const nLeg = checkLeg(s.n, s.n.area, input.hotSide, coldSide, `${at}.n`, coldField);
    checkCarriers(p, nLeg, at);
    return { couples: s.couples, p, n: nLeg, interfaceResistance: s.interfaceResistance ?? 0 };
  });
  const limit = input.optimizeCouples ?? null;
  if (limit && 'total' in limit && limit.total < n) throw new CaseError('optimizeCouples.total', `must be at least the number of stages (${n}): every stage keeps at least one couple`);
  if (limit && 'baseArea' in limit) {
    const a = coupleArea(stages[n - 1]);
    if (limit.baseArea < a) throw new CaseError('optimizeCouples.baseArea', `is smaller than one couple of the hottest stage (${a.toPrecision(3)} m²): it is the hottest stage's total leg cross-section N·(A_p + A_n) in m²`);
  }
  return {
    hotSide: input.hotSide,
    objective,
    wiring,
    heatLoad: input.heatLoad ?? 0,
    coldSide: coldSide ?? null,
    stages,
    currents,
    optimizeCouples: limit,
    curvePoints: input.curvePoints ?? DEFAULT_CASCADE_CURVE_POINTS,
  };
}
