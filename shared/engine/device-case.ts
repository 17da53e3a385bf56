/**
 * Cases for operating curves (`leg curves FILE`) and couples/modules
 * (`leg module FILE`): zod schemas shared by server and client, and the
 * checks that turn JSON into typed definitions or a CaseError naming the
 * field. A leg is described exactly as in a solve case (length, area, a
 * material with its doping, or segments), so a stored run's case and result
 * give one directly (see run-legs.ts).
 */
import { z } from 'zod';
import { CaseError } from './case-error';
import { caseSchema, contactResistivitySchema, parasiticSchema, type CaseInput } from './case-schema';
import { fieldPath, parseCase, type CheckedCase, type Mode } from './check-case';
import type { DeltaTOptions } from './delta-t-curve';
import type { LegDefinition, ModuleDefinition, TradeOptions } from './module';
import type { CurveConditions, CurveOptions } from './operating-curve';

const shape = caseSchema.shape;

export const count = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a whole number` })
    .int({ error: `${what} must be a whole number` })
    .min(min, { error: `${what} must be at least ${min}` })
    .max(max, { error: `${what} must be at most ${max}` });

export const positiveUpTo = (what: string, max: number, hint: string) =>
  z
    .number({ error: (issue) => (issue.input === undefined ? `${what} is required` : `${what} must be a finite number`) })
    .gt(0, { error: `${what} must be greater than 0` })
    .max(max, { error: `${what} above ${max} is implausible: ${hint}` });

const plateResistance = (what: string) =>
  z
    .number({ error: `${what} must be a finite number` })
    .min(0, { error: `${what} must not be negative` })
    .max(1e3, { error: `${what} above 1000 K/W is implausible: it is the plate's thermal resistance in K/W for the whole module (a ceramic plate is ~0.01–1 K/W)` });

const deltaTSchema = z
  .number({ error: 'deltaT must be a finite number' })
  .min(0, { error: 'deltaT must not be negative: the curves are for cooling, the load at or below the sink' })
  .max(5000, { error: 'deltaT above 5000 K is implausible: temperatures are in kelvin' });

const currentLimitSchema = positiveUpTo('currentLimit', 1e4, 'the limit is in amperes');

/** The leg fields of a solve case, without conditions or optimiser settings. */
export const legFields = {
  description: shape.description,
  length: shape.length,
  area: shape.area,
  material: shape.material,
  doping: shape.doping,
  segments: shape.segments,
  /** Ω·m²: both junctions, or {cold, hot}; default 0. */
  contactResistivity: contactResistivitySchema.optional(),
  /** Heat onto the leg besides the load (W, or radiation onto its sides); default none. */
  parasitic: parasiticSchema.optional(),
};

/** One leg: `{length, area, material, doping}` or `{length, area, segments}`, optional contactResistivity. */
export const legDefinitionSchema = z.strictObject(legFields);

/** A module's leg: as above; the n leg's area may come from areaRatio instead. */
export const moduleLegSchema = z.strictObject({ ...legFields, area: shape.area.optional() });

const moduleLeg = (side: 'p' | 'n') =>
  z.strictObject(moduleLegSchema.shape, {
    error: (issue) =>
      issue.input === undefined
        ? `${side} is required: the ${side}-type leg, {length, area, material, doping} or {length, area, segments}`
        : `${side} must be an object: {length, area, material, doping} or {length, area, segments}`,
  });

/** `leg curves FILE`: one leg (fields at the top level, as in a solve case) and the conditions. */
export const curvesCaseSchema = z.strictObject({
  ...legFields,
  hotSide: shape.hotSide,
  coldSide: shape.coldSide,
  deltaT: deltaTSchema.optional(),
  points: count('points', 2, 1000).optional(),
  currentLimit: currentLimitSchema.optional(),
});

/** `leg module FILE`: two legs, the module and the conditions. */
export const moduleCaseSchema = z.strictObject({
  description: shape.description,
  hotSide: shape.hotSide,
  coldSide: shape.coldSide,
  deltaT: deltaTSchema.optional(),
  p: moduleLeg('p'),
  n: moduleLeg('n'),
  couples: count('couples', 1, 100000).optional(),
  areaRatio: positiveUpTo('areaRatio', 100, 'it is A_n / A_p, the n leg’s cross-section over the p leg’s').optional(),
  contactResistivity: contactResistivitySchema.optional(),
  coldPlateResistance: plateResistance('coldPlateResistance').optional(),
  hotPlateResistance: plateResistance('hotPlateResistance').optional(),
  currentLimit: currentLimitSchema.optional(),
  points: count('points', 2, 1000).optional(),
  deltaTPoints: count('deltaTPoints', 2, 1000).optional(),
  deltaTCurrent: positiveUpTo('deltaTCurrent', 1e4, 'the current is in amperes').optional(),
  tradeCouples: z.array(count('tradeCouples', 1, 100000), { error: 'tradeCouples must be a list of whole numbers' }).min(1).max(50).optional(),
});

export type LegDefinitionInput = z.infer<typeof legDefinitionSchema>;
export type CurvesCaseInput = z.infer<typeof curvesCaseSchema>;
export type ModuleCaseInput = z.infer<typeof moduleCaseSchema>;

export type CurvesCase = { leg: LegDefinition; conditions: CurveConditions; options: CurveOptions };

export type ModuleCase = {
  module: ModuleDefinition;
  conditions: CurveConditions;
  /** A_n / A_p as used. */
  areaRatio: number;
  options: CurveOptions;
  deltaT: DeltaTOptions;
  trade: TradeOptions;
};

/** The first schema issue as a CaseError naming its field (also used by couple-case.ts). */
export function firstIssue(error: z.ZodError): CaseError {
  const issue = error.issues[0];
  if (issue.code === 'unrecognized_keys') {
    return new CaseError(fieldPath([...issue.path, issue.keys[0]]), 'unknown field (check its spelling; see PHYSICS.md for the case fields)');
  }
  return new CaseError(fieldPath(issue.path), issue.message);
}

/** A CaseError's message without its field, to name it under another path. */
export const messageOf = (e: CaseError) => e.message.slice(e.field.length + 2);

export type LegJson = Omit<LegDefinitionInput, 'area'> & { area?: number };

/**
 * A leg checked exactly as a solve case checks it (doping ranges, table
 * temperatures, segment fractions) — or, in 'optimize' mode, as an optimize
 * case (bounds, control points; doping then optional) — with errors named
 * under `prefix`.
 */
export function checkLegCase(
  input: LegJson & Pick<CaseInput, 'bounds' | 'controlPoints' | 'monotone'>,
  area: number,
  hotSide: number,
  coldSide: number | undefined,
  prefix: string,
  coldField: string,
  mode: Mode = 'solve',
): CheckedCase {
  const at = (field: string) => (prefix ? `${prefix}.${field}` : field);
  if (mode === 'solve' && input.material && input.material.kind !== 'constant' && input.doping === undefined) {
    throw new CaseError(at('doping'), 'is required for a table or band material: a number (cm⁻³) or {x, perCm3}');
  }
  const { description: _description, ...leg } = input;
  // optimize mode: only coldSide's range matters here, so a given coldSide is checked as maxHeatLoad's.
  const conditions = mode === 'solve' ? { current: 0 } : { objective: coldSide !== undefined ? 'maxHeatLoad' : 'maxDeltaT' };
  try {
    return parseCase({ ...leg, area, hotSide, ...(coldSide !== undefined ? { coldSide } : {}), ...conditions }, mode);
  } catch (e) {
    if (!(e instanceof CaseError)) throw e;
    if (e.field === 'hotSide') throw e;
    if (e.field === 'coldSide') throw new CaseError(coldField, messageOf(e));
    throw new CaseError(at(e.field), messageOf(e));
  }
}

/** A solve-checked leg as a leg definition. */
export function checkLeg(input: LegJson, area: number, hotSide: number, coldSide: number | undefined, prefix: string, coldField: string): LegDefinition {
  const c = checkLegCase(input, area, hotSide, coldSide, prefix, coldField);
  return { length: c.length, area: c.area, leg: c.leg, ...(c.ends ? { ends: c.ends } : {}) };
}

function checkColdSide(input: { hotSide: number; coldSide?: number; deltaT?: number }): { conditions: CurveConditions; coldSide: number | undefined; coldField: string } {
  if (input.coldSide !== undefined && input.deltaT !== undefined) throw new CaseError('deltaT', 'give either deltaT or coldSide, not both');
  if (input.coldSide === undefined && input.deltaT === undefined) throw new CaseError('deltaT', 'is required (or give coldSide): the temperature difference the curves are for [K]');
  if (input.deltaT !== undefined) {
    if (!(input.deltaT < input.hotSide)) throw new CaseError('deltaT', `must be below hotSide (${input.hotSide} K)`);
    return { conditions: { hotSide: input.hotSide, deltaT: input.deltaT }, coldSide: input.hotSide - input.deltaT, coldField: 'deltaT' };
  }
  const coldSide = input.coldSide as number;
  if (coldSide > input.hotSide) throw new CaseError('coldSide', `must not be above hotSide (${input.hotSide} K): the curves are for cooling`);
  return { conditions: { hotSide: input.hotSide, coldSide }, coldSide, coldField: 'coldSide' };
}

/** The case must be a JSON object. */
export const asObject = (json: unknown) => {
  if (typeof json !== 'object' || json === null || Array.isArray(json)) throw new CaseError('(case)', 'a case must be a JSON object');
  return json;
};

/** One leg definition from JSON (fields as in a solve case); `prefix` names the fields in errors. */
export function parseLegDefinition(json: unknown, hotSide: number, prefix = ''): LegDefinition {
  const parsed = legDefinitionSchema.safeParse(asObject(json));
  if (!parsed.success) {
    const e = firstIssue(parsed.error);
    throw prefix ? new CaseError(`${prefix}.${e.field}`, messageOf(e)) : e;
  }
  return checkLeg(parsed.data, parsed.data.area, hotSide, undefined, prefix, 'coldSide');
}

/** Validate a `leg curves` case. */
export function parseCurvesCase(json: unknown): CurvesCase {
  const parsed = curvesCaseSchema.safeParse(asObject(json));
  if (!parsed.success) throw firstIssue(parsed.error);
  const input = parsed.data;
  if (input.segments && input.material) throw new CaseError('segments', 'give either segments or a material, not both');
  if (!input.segments && !input.material) throw new CaseError('material', 'give either segments or a material');
  const { conditions, coldSide, coldField } = checkColdSide(input);
  const { hotSide: _h, coldSide: _c, deltaT: _d, points, currentLimit, ...legInput } = input;
  const leg = checkLeg(legInput, input.area, input.hotSide, coldSide, '', coldField);
  return { leg, conditions, options: { points, currentLimit } };
}

/** Validate a `leg module` case. */
export function parseModuleCase(json: unknown): ModuleCase {
  const parsed = moduleCaseSchema.safeParse(asObject(json));
  if (!parsed.success) throw firstIssue(parsed.error);
  const input = parsed.data;
  const { conditions, coldSide, coldField } = checkColdSide(input);
  for (const side of ['p', 'n'] as const) {
    const leg = input[side];
    if (leg.segments && leg.material) throw new CaseError(`${side}.segments`, 'give either segments or a material, not both');
    if (!leg.segments && !leg.material) throw new CaseError(`${side}.material`, 'give either segments or a material');
  }
  const pArea = input.p.area;
  if (pArea === undefined) throw new CaseError('p.area', 'is required: the p leg’s cross-section [m²]');
  let nArea: number;
  if (input.areaRatio !== undefined) {
    if (input.n.area !== undefined) throw new CaseError('areaRatio', 'give either areaRatio or n.area, not both');
    nArea = input.areaRatio * pArea;
  } else {
    if (input.n.area === undefined) throw new CaseError('n.area', 'is required (or give areaRatio = A_n / A_p)');
    nArea = input.n.area;
  }
  const contact = (leg: LegJson) => leg.contactResistivity ?? input.contactResistivity;
  const legOf = (side: 'p' | 'n', area: number) => {
    const leg = input[side];
    const c = contact(leg);
    return checkLeg({ ...leg, ...(c !== undefined ? { contactResistivity: c } : {}) }, area, input.hotSide, coldSide, side, coldField);
  };
  const p = legOf('p', pArea);
  const n = legOf('n', nArea);
  const module: ModuleDefinition = {
    p,
    n,
    couples: input.couples ?? 1,
    coldPlateResistance: input.coldPlateResistance ?? 0,
    hotPlateResistance: input.hotPlateResistance ?? 0,
  };
  // The carriers: checked here so the error names the case's fields.
  if (p.leg.kind === 'family' ? p.leg.family.sign !== 1 : p.leg.segments[0].seebeck < 0) throw new CaseError(`p.${p.leg.kind === 'family' ? 'material' : 'segments'}`, 'the p leg must be p-type (positive Seebeck coefficient)');
  if (n.leg.kind === 'family' ? n.leg.family.sign !== -1 : n.leg.segments[0].seebeck > 0) throw new CaseError(`n.${n.leg.kind === 'family' ? 'material' : 'segments'}`, 'the n leg must be n-type (negative Seebeck coefficient)');
  return {
    module,
    conditions,
    areaRatio: nArea / pArea,
    options: { points: input.points, currentLimit: input.currentLimit },
    deltaT: { points: input.deltaTPoints, current: input.deltaTCurrent, currentLimit: input.currentLimit },
    trade: { couples: input.tradeCouples, currentLimit: input.currentLimit },
  };
}
