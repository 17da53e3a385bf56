/**
 * parseCase: raw JSON → a fully checked, typed case, or a CaseError naming
 * the offending field by its path. Defaults are applied here, before any
 * solving starts, so the solver never sees a half-valid case.
 */
import { z } from 'zod';
import { bandFamily } from './band-model';
import { CaseError } from './case-error';
import { caseSchema, MAX_PER_CM3, MIN_PER_CM3, type CaseInput, type MaterialInput } from './case-schema';
import type { Objective } from './evaluate-design';
import { legEndsOf, type LegEnds } from './leg-ends';
import type { Segment } from './leg-profile';
import { constantFamily, type MaterialFamily } from './material-family';
import { tableFamily } from './table-family';

export type Mode = 'solve' | 'optimize';

export type CheckedLeg =
  | { kind: 'segments'; segments: Segment[]; freeFractions: boolean }
  | {
      kind: 'family';
      material: MaterialInput;
      family: MaterialFamily;
      /** Doping profile: node fractions and log10(n / cm⁻³); absent = none given. */
      doping?: { x: number[]; log10: number[] };
      /** Optimisation bounds, log10(n / cm⁻³). */
      bounds?: { lower: number; upper: number };
      /** @default 6 */
      controlPoints: number;
      /** @default false */
      monotone: boolean;
    };

export type CheckedCase = {
  mode: Mode;
  hotSide: number;
  length: number;
  area: number;
  /** Given heat load [W] (solve: absent when coldSide is given). */
  heatLoad?: number;
  current?: number;
  coldSide?: number;
  /** @default 'maxDeltaT' */
  objective: Objective;
  leg: CheckedLeg;
  /** Contacts of each junction and parasitic heat; present only when some are not ideal. */
  ends?: LegEnds;
};

/** Default number of doping nodes for optimize. */
export const DEFAULT_CONTROL_POINTS = 6;

/** `['doping', 'perCm3', 3]` → `doping.perCm3[3]`. */
export function fieldPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out ? `.${String(p)}` : String(p);
  }
  return out || '(case)';
}

function firstIssue(error: z.ZodError): CaseError {
  const issue = error.issues[0];
  if (issue.code === 'unrecognized_keys') {
    const key = issue.keys[0];
    return new CaseError(fieldPath([...issue.path, key]), 'unknown field (check its spelling; see PHYSICS.md for the case fields)');
  }
  return new CaseError(fieldPath(issue.path), issue.message);
}

const notWith = (field: string, reason: string) => new CaseError(field, reason);

function checkSegments(input: CaseInput): Segment[] {
  const segments = input.segments as Segment[];
  const total = segments.reduce((s, g) => s + g.fraction, 0);
  if (Math.abs(total - 1) > 1e-6) throw new CaseError('segments', `fractions add up to ${total.toPrecision(6)}; they must add up to 1`);
  const sign = Math.sign(segments[0].seebeck);
  segments.forEach((s, k) => {
    if (Math.sign(s.seebeck) !== sign) throw new CaseError(`segments[${k}].seebeck`, 'all segments of one leg must have a Seebeck coefficient of the same sign (one carrier type)');
  });
  return segments;
}

/** The family a material description defines (throws CaseError for a bad table). */
export function familyFromMaterial(material: MaterialInput): MaterialFamily {
  switch (material.kind) {
    case 'constant':
      return constantFamily(material.seebeck, material.sigma, material.kappa);
    case 'table':
      return tableFamily(material.rows, 'material.rows');
    case 'band':
      return bandFamily(material);
  }
}

function checkDopingProfile(input: CaseInput, family: MaterialFamily): { x: number[]; log10: number[] } | undefined {
  const doping = input.doping;
  if (doping === undefined) return undefined;
  const inRange = (v: number, field: string) => {
    const y = Math.log10(v);
    if (y < family.minLog10Doping - 1e-9 || y > family.maxLog10Doping + 1e-9) {
      throw new CaseError(
        field,
        `${v.toExponential()} cm⁻³ is outside the table's doping range ${Math.pow(10, family.minLog10Doping).toPrecision(3)}–${Math.pow(10, family.maxLog10Doping).toPrecision(3)} cm⁻³`,
      );
    }
    return y;
  };
  if (typeof doping === 'number') return { x: [0, 1], log10: [inRange(doping, 'doping'), inRange(doping, 'doping')] };
  if (doping.perCm3.length !== doping.x.length) throw new CaseError('doping.perCm3', `needs as many values as doping.x (${doping.x.length})`);
  doping.x.forEach((v, k) => {
    if (v < 0 || v > 1) throw new CaseError(`doping.x[${k}]`, 'node positions are fractions of the length, from 0 (cold end) to 1 (hot end)');
    if (k > 0 && !(v > doping.x[k - 1])) throw new CaseError(`doping.x[${k}]`, 'node positions must increase strictly');
  });
  if (doping.x[0] !== 0) throw new CaseError('doping.x[0]', 'the first node must be at the cold end, 0');
  if (doping.x[doping.x.length - 1] !== 1) throw new CaseError(`doping.x[${doping.x.length - 1}]`, 'the last node must be at the hot end, 1');
  return { x: [...doping.x], log10: doping.perCm3.map((v, k) => inRange(v, `doping.perCm3[${k}]`)) };
}

function checkTemperatureRange(family: MaterialFamily, value: number | undefined, field: string) {
  if (value === undefined) return;
  // A band model's range is 1–2000 K, narrowed by a minority band whose gap Eg0 − β·T closes earlier.
  if (family.kind === 'band' && value > family.maxTemperature) {
    throw new CaseError(field, `${value} K is above ${Number(family.maxTemperature.toPrecision(4))} K, where the band gap Eg0 − β·T of material.minority closes`);
  }
  if (family.kind !== 'table') return;
  if (value < family.minTemperature || value > family.maxTemperature) {
    throw new CaseError(field, `${value} K is outside the table's temperature range ${family.minTemperature}–${family.maxTemperature} K`);
  }
}

function checkBounds(input: CaseInput, family: MaterialFamily, mode: Mode): { lower: number; upper: number } | undefined {
  if (input.bounds) {
    const { minPerCm3, maxPerCm3 } = input.bounds;
    if (!(maxPerCm3 > minPerCm3)) throw new CaseError('bounds.maxPerCm3', 'must be greater than bounds.minPerCm3');
    const lower = Math.log10(minPerCm3);
    const upper = Math.log10(maxPerCm3);
    if (lower < family.minLog10Doping - 1e-9) throw new CaseError('bounds.minPerCm3', `is below the table's lowest doping ${Math.pow(10, family.minLog10Doping).toPrecision(3)} cm⁻³`);
    if (upper > family.maxLog10Doping + 1e-9) throw new CaseError('bounds.maxPerCm3', `is above the table's highest doping ${Math.pow(10, family.maxLog10Doping).toPrecision(3)} cm⁻³`);
    return { lower, upper };
  }
  if (family.kind === 'table') return { lower: family.minLog10Doping, upper: family.maxLog10Doping };
  if (mode === 'optimize' && family.kind === 'band') throw new CaseError('bounds', 'required to optimise a band-model doping profile: {minPerCm3, maxPerCm3}');
  return undefined;
}

/** Which of coldSide, heatLoad and current each objective needs (also a couple case's rules). */
export function checkConditions(input: Pick<CaseInput, 'current' | 'coldSide' | 'heatLoad'>, mode: Mode, objective: Objective) {
  if (mode === 'solve') {
    if (input.current === undefined) throw new CaseError('current', 'is required for solve');
    if (input.coldSide !== undefined && input.heatLoad !== undefined) throw new CaseError('coldSide', 'give heatLoad or coldSide for solve, not both: the other one is computed');
    return;
  }
  if (objective === 'maxDeltaT' && input.coldSide !== undefined) throw notWith('coldSide', 'is only used by the maxHeatLoad and maxCop objectives (maxDeltaT computes it)');
  if (objective !== 'maxDeltaT' && input.coldSide === undefined) throw new CaseError('coldSide', `is required for ${objective}`);
  if (objective === 'maxHeatLoad' && input.heatLoad !== undefined) throw notWith('heatLoad', 'is what maxHeatLoad computes: leave it out');
  if (objective === 'maxCop') {
    if (!(input.heatLoad !== undefined && input.heatLoad > 0)) throw new CaseError('heatLoad', 'maxCop needs a heat load greater than 0');
    if (input.current !== undefined) throw notWith('current', 'is set by coldSide, hotSide and heatLoad for maxCop: leave it out');
  }
}

/** Validate a case (already parsed from JSON) for solve or optimize (the default). */
export function parseCase(json: unknown, mode: Mode = 'optimize'): CheckedCase {
  if (typeof json !== 'object' || json === null || Array.isArray(json)) throw new CaseError('(case)', 'a case must be a JSON object');
  const parsed = caseSchema.safeParse(json);
  if (!parsed.success) throw firstIssue(parsed.error);
  const input = parsed.data;
  const objective: Objective = input.objective ?? 'maxDeltaT';
  if (input.segments && input.material) throw new CaseError('segments', 'give either segments or a material, not both');
  if (!input.segments && !input.material) throw new CaseError('material', 'give either segments or a material');
  checkConditions(input, mode, objective);
  const ends = legEndsOf(input.contactResistivity, input.parasitic);
  const base = { mode, hotSide: input.hotSide, length: input.length, area: input.area, current: input.current, coldSide: input.coldSide, objective, ...(ends ? { ends } : {}) };
  const heatLoad = mode === 'solve' ? (input.coldSide === undefined ? (input.heatLoad ?? 0) : undefined) : objective === 'maxHeatLoad' ? undefined : (input.heatLoad ?? 0);

  if (input.segments) {
    for (const field of ['doping', 'bounds', 'controlPoints', 'monotone'] as const) {
      if (input[field] !== undefined) throw notWith(field, 'is only used with a material family, not with segments');
    }
    return { ...base, heatLoad, leg: { kind: 'segments', segments: checkSegments(input), freeFractions: input.freeFractions ?? false } };
  }
  if (input.freeFractions !== undefined) throw notWith('freeFractions', 'is only used with segments');
  const material = input.material as MaterialInput;
  const family = familyFromMaterial(material);
  if (material.kind === 'constant') {
    for (const field of ['doping', 'bounds', 'controlPoints', 'monotone'] as const) {
      if (input[field] !== undefined) throw notWith(field, 'a constant material does not depend on doping');
    }
  }
  checkTemperatureRange(family, input.hotSide, 'hotSide');
  checkTemperatureRange(family, input.coldSide, 'coldSide');
  const doping = checkDopingProfile(input, family);
  if (mode === 'solve' && material.kind !== 'constant' && !doping) throw new CaseError('doping', 'is required for solve: a number (cm⁻³) or {x, perCm3}');
  const bounds = material.kind === 'constant' ? undefined : checkBounds(input, family, mode);
  return {
    ...base,
    heatLoad,
    leg: { kind: 'family', material, family, doping, bounds, controlPoints: input.controlPoints ?? DEFAULT_CONTROL_POINTS, monotone: input.monotone ?? false },
  };
}

export { MIN_PER_CM3, MAX_PER_CM3 };
