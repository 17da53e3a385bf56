/**
 * A matched-couple case (`leg couple FILE`, and the case of a couple run):
 * a p leg and an n leg sharing one current and one pair of junction
 * temperatures, each leg fixed or with its doping profile optimised, the
 * current and the n/p area ratio free unless given. See PHYSICS.md,
 * "Matched couples".
 *
 * Area convention: with `areaRatio` given, A_n = areaRatio·A_p (n.area must
 * then be absent). Without it the ratio is optimised with the couple's total
 * cross-section A_p + A_n held at p.area + n.area (n.area defaulting to
 * p.area): a free ratio that also grew the total would just scale the couple.
 */
import { z } from 'zod';
import { CaseError } from './case-error';
import { caseSchema, contactResistivitySchema } from './case-schema';
import { checkConditions, type CheckedCase } from './check-case';
import { asObject, checkLegCase, firstIssue, legFields, positiveUpTo, type LegDefinitionInput } from './device-case';
import type { Objective } from './evaluate-design';
import type { LegEnds } from './leg-ends';
import type { LegDefinition } from './module';
import type { MaterialFamily } from './material-family';

const shape = caseSchema.shape;

/** Box of the free area ratio A_n / A_p. */
export const AREA_RATIO_BOUNDS = { lower: 0.1, upper: 10 } as const;

const coupleLeg = (side: 'p' | 'n') =>
  z.strictObject(
    {
      ...legFields,
      area: shape.area.optional(),
      bounds: shape.bounds,
      controlPoints: shape.controlPoints,
      monotone: shape.monotone,
    },
    {
      error: (issue) =>
        issue.input === undefined
          ? `${side} is required: the ${side}-type leg, {length, area, material, doping} or {length, area, segments} (add bounds to optimise its profile)`
          : `${side} must be an object: {length, area, material, doping} or {length, area, segments}`,
    },
  );

/** `leg couple FILE`: two legs, one current, the conditions and the objective. */
export const coupleCaseSchema = z.strictObject({
  description: shape.description,
  hotSide: shape.hotSide,
  /** W per couple, drawn from the load. */
  heatLoad: shape.heatLoad,
  coldSide: shape.coldSide,
  p: coupleLeg('p'),
  n: coupleLeg('n'),
  areaRatio: positiveUpTo('areaRatio', 100, 'it is A_n / A_p, the n leg’s cross-section over the p leg’s').optional(),
  current: shape.current,
  objective: shape.objective,
  contactResistivity: contactResistivitySchema.optional(),
});

export type CoupleCaseInput = z.infer<typeof coupleCaseSchema>;
type CoupleLegInput = CoupleCaseInput['p'];

/** One leg of a checked couple. */
export type CoupleLegCase = {
  length: number;
  /** Cross-section [m²] as given (n: n.area, areaRatio·p.area, or p.area). */
  area: number;
  ends?: LegEnds;
  /** The leg as it stands (an optimised leg: its starting doping, if any). */
  leg: LegDefinition['leg'];
  /** Present when the profile is optimised: family, log10 bounds, nodes, monotone, and a starting profile. */
  profile?: { family: MaterialFamily; lower: number; upper: number; controlPoints: number; monotone: boolean; start?: { x: number[]; log10: number[] } };
  /** The leg's JSON fields besides geometry and doping, for the result's `leg`. */
  fields: Pick<LegDefinitionInput, 'material' | 'segments' | 'contactResistivity' | 'parasitic'>;
};

export type CheckedCoupleCase = {
  hotSide: number;
  objective: Objective;
  /** W per couple: given for maxDeltaT (default 0) and maxCop; absent for maxHeatLoad. */
  heatLoad?: number;
  coldSide?: number;
  /** Fixed current [A]; absent = optimised (maxCop: set by the conditions). */
  current?: number;
  /** Fixed A_n / A_p; absent = optimised at a fixed total area. */
  areaRatio?: number;
  p: CoupleLegCase;
  n: CoupleLegCase;
};

function checkCoupleLeg(input: CoupleLegInput, side: 'p' | 'n', area: number, top: CoupleCaseInput): CoupleLegCase {
  if (input.segments && input.material) throw new CaseError(`${side}.segments`, 'give either segments or a material, not both');
  if (!input.segments && !input.material) throw new CaseError(`${side}.material`, 'give either segments or a material');
  const optimised = input.bounds !== undefined;
  if (!optimised) {
    for (const field of ['controlPoints', 'monotone'] as const) {
      if (input[field] !== undefined) throw new CaseError(`${side}.${field}`, `is only used when the profile is optimised: add ${side}.bounds {minPerCm3, maxPerCm3}`);
    }
  }
  const contactResistivity = input.contactResistivity ?? top.contactResistivity;
  const { description: _d, area: _a, ...leg } = input;
  const json = { ...leg, ...(contactResistivity !== undefined ? { contactResistivity } : {}) };
  const coldField = 'coldSide';
  const c: CheckedCase = checkLegCase(json, area, top.hotSide, top.coldSide, side, coldField, optimised ? 'optimize' : 'solve');
  const sign = c.leg.kind === 'family' ? c.leg.family.sign : Math.sign(c.leg.segments[0].seebeck);
  const want = side === 'p' ? 1 : -1;
  if (sign !== want) {
    throw new CaseError(`${side}.${c.leg.kind === 'family' ? 'material' : 'segments'}`, `the ${side} leg must be ${side}-type (${side === 'p' ? 'positive' : 'negative'} Seebeck coefficient)`);
  }
  const legOf: LegDefinition['leg'] = c.leg.kind === 'segments' ? { kind: 'segments', segments: c.leg.segments } : { kind: 'family', family: c.leg.family, ...(c.leg.doping ? { doping: c.leg.doping } : {}) };
  const bounds = c.leg.kind === 'family' ? c.leg.bounds : undefined;
  return {
    length: c.length,
    area: c.area,
    ...(c.ends ? { ends: c.ends } : {}),
    leg: legOf,
    ...(optimised && c.leg.kind === 'family' && bounds
      ? { profile: { family: c.leg.family, lower: bounds.lower, upper: bounds.upper, controlPoints: c.leg.controlPoints, monotone: c.leg.monotone, ...(c.leg.doping ? { start: c.leg.doping } : {}) } }
      : {}),
    fields: {
      ...(input.material ? { material: input.material } : {}),
      ...(input.segments ? { segments: input.segments } : {}),
      ...(contactResistivity !== undefined ? { contactResistivity } : {}),
      ...(input.parasitic ? { parasitic: input.parasitic } : {}),
    },
  };
}

/** Validate a `leg couple` case; throws CaseError naming the field. */
export function parseCoupleCase(json: unknown): CheckedCoupleCase {
  const parsed = coupleCaseSchema.safeParse(asObject(json));
  if (!parsed.success) throw firstIssue(parsed.error);
  const input = parsed.data;
  const objective: Objective = input.objective ?? 'maxDeltaT';
  checkConditions(input, 'optimize', objective);
  if (input.coldSide !== undefined && !(input.coldSide < input.hotSide)) throw new CaseError('coldSide', `must be below hotSide (${input.hotSide} K): the couple is for cooling`);
  const pArea = input.p.area;
  if (pArea === undefined) throw new CaseError('p.area', 'is required: the p leg’s cross-section [m²]');
  let nArea: number;
  if (input.areaRatio !== undefined) {
    if (input.n.area !== undefined) throw new CaseError('areaRatio', 'give either areaRatio or n.area, not both (leave both out to optimise the ratio)');
    nArea = input.areaRatio * pArea;
  } else {
    // Free ratio: the total p.area + n.area is kept and split.
    nArea = input.n.area ?? pArea;
  }
  const p = checkCoupleLeg(input.p, 'p', pArea, input);
  const n = checkCoupleLeg(input.n, 'n', nArea, input);
  return {
    hotSide: input.hotSide,
    objective,
    ...(objective === 'maxHeatLoad' ? {} : { heatLoad: input.heatLoad ?? 0 }),
    ...(input.coldSide !== undefined ? { coldSide: input.coldSide } : {}),
    ...(input.current !== undefined ? { current: input.current } : {}),
    ...(input.areaRatio !== undefined ? { areaRatio: input.areaRatio } : {}),
    p,
    n,
  };
}
