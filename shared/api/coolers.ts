import { z } from 'zod';
import { idSchema, isoDateTimeSchema } from './common';
import { objectiveSchema } from './designs';
import { legSourceSchema } from './modules';
import { runDetailSchema, runProgressSchema, runSummarySchema, tracePointSchema } from './runs';

/**
 * Coolers: a matched couple (a p and an n leg optimised together on one
 * current, the area ratio free) or a cascade (2–4 stages of couples, the
 * coldest first). Both are saved setups that are launched as runs on the
 * same queue as leg runs; the run's engine case is the command line's
 * `couple` / `cascade` case (shared/engine/PHYSICS.md) and its result is the
 * command's output. Settings are in the trade's units (K, W, mm, mm², K/W).
 */

const num = (field: string) => z.number({ error: `${field} must be a number` }).refine(Number.isFinite, { error: `${field} must be a finite number` });
const name = z.string({ error: 'name is required' }).trim().min(1, { error: 'name is required' }).max(120);
const notes = z.string().trim().max(4000).default('');
const hotSide = num('hotSide').min(100, { error: 'hotSide below 100 K is outside what the families describe' }).max(1000, { error: 'hotSide above 1000 K is implausible (temperatures are in kelvin)' });
const coldSide = num('coldSide').min(20).max(1000);
const starts = (what: string, fallback: number) =>
  z.number({ error: `${what} must be a whole number` }).int({ error: `${what} must be a whole number` }).min(1, { error: `${what} must be at least 1` }).max(500, { error: `${what} must be at most 500` }).default(fallback);

/**
 * A leg of a matched couple: a leg design (its profile is optimised within
 * the design's family, doping bounds, control points and monotone setting;
 * length, area and contacts from the design), or a fixed leg (a finished
 * run's optimum or baseline, or a family at uniform doping).
 */
export const coupleLegSourceSchema = z.union([z.strictObject({ kind: z.literal('design'), designId: idSchema }), legSourceSchema], {
  error: 'a couple leg is {kind: "design", designId}, {kind: "run", runId, leg} or {kind: "family", familyId, perCm3, lengthMm, areaMm2}',
});

/** `POST /api/coolers` with kind "couple". heatLoad is per couple [W]. */
export const coupleInputSchema = z
  .strictObject({
    kind: z.literal('couple'),
    name,
    notes,
    p: coupleLegSourceSchema,
    n: coupleLegSourceSchema,
    hotSide,
    objective: objectiveSchema.default('maxDeltaT'),
    heatLoad: num('heatLoad').min(0, { error: 'heatLoad must not be negative' }).max(100, { error: 'heatLoad above 100 W on one couple is implausible (it is in watts per couple)' }).default(0),
    coldSide: coldSide.optional(),
    /** A_n / A_p; absent = optimised (the couple's total cross-section kept). */
    areaRatio: num('areaRatio').gt(0, { error: 'areaRatio must be greater than 0' }).max(100).optional(),
    starts: starts('starts', 8),
  })
  .refine((d) => d.objective === 'maxDeltaT' || d.coldSide !== undefined, { error: 'coldSide is required for the heat-load and COP objectives', path: ['coldSide'] })
  .refine((d) => d.coldSide === undefined || d.coldSide < d.hotSide, { error: 'coldSide must be below hotSide', path: ['coldSide'] });

/** Where a cascade stage's couples come from: two leg sources, or both legs of a finished matched-couple run. */
export const stageSourceSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('legs'), p: legSourceSchema, n: legSourceSchema }),
  z.strictObject({ kind: z.literal('couple'), runId: idSchema }),
], { error: 'a stage is {kind: "legs", p, n} or {kind: "couple", runId}' });

export const stageInputSchema = z.strictObject({
  couples: z.number({ error: 'couples must be a whole number' }).int({ error: 'couples must be a whole number' }).min(1, { error: 'couples must be at least 1: a stage without couples cannot pump heat' }).max(10000),
  source: stageSourceSchema,
  /** Thermal resistance from this stage's hot side to the next stage (or the sink) [K/W]: ceramic plates, grease. */
  interfaceResistance: num('interfaceResistance').min(0, { error: 'interfaceResistance must not be negative' }).max(1000, { error: 'interfaceResistance above 1000 K/W is implausible (it is in K/W)' }).default(0),
});

/** The limit on the couple counts when they are optimised. */
export const couplesLimitSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('total'), total: z.number().int().min(2).max(40000) }),
  z.strictObject({ kind: z.literal('baseArea'), baseAreaMm2: num('baseAreaMm2').gt(0).max(1e5) }),
], { error: 'couplesLimit is {kind: "total", total} or {kind: "baseArea", baseAreaMm2}' });

/** `POST /api/coolers` with kind "cascade": stages coldest first; heatLoad on the coldest stage [W]. */
export const cascadeInputSchema = z
  .strictObject({
    kind: z.literal('cascade'),
    name,
    notes,
    hotSide,
    objective: z.enum(['maxDeltaT', 'minPower'], { error: 'objective must be maxDeltaT or minPower' }).default('maxDeltaT'),
    heatLoad: num('heatLoad').min(0, { error: 'heatLoad must not be negative' }).max(1000).default(0),
    coldSide: coldSide.optional(),
    wiring: z.enum(['series', 'separate'], { error: 'wiring must be series or separate' }).default('series'),
    stages: z.array(stageInputSchema).min(1, { error: 'a cascade needs at least one stage' }).max(4, { error: 'a cascade has at most 4 stages' }),
    /** null: the counts are as given; else they are optimised within the limit. */
    couplesLimit: couplesLimitSchema.nullable().default(null),
    starts: starts('starts', 4),
  })
  .refine((d) => d.objective === 'maxDeltaT' || d.coldSide !== undefined, { error: 'coldSide is required for the least-power objective', path: ['coldSide'] })
  .refine((d) => d.objective === 'maxDeltaT' || d.heatLoad > 0, { error: 'heatLoad must be greater than 0 for the least-power objective', path: ['heatLoad'] })
  .refine((d) => d.coldSide === undefined || d.coldSide < d.hotSide, { error: 'coldSide must be below hotSide', path: ['coldSide'] });

export const coolerInputSchema = z.union([coupleInputSchema, cascadeInputSchema], { error: 'kind must be "couple" or "cascade"' });

export const coolerKindSchema = z.enum(['couple', 'cascade']);

/** What the engine returned for one leg of a matched couple (SI). */
export const coupleLegResultSchema = z.object({
  length: z.number(),
  area: z.number(),
  doping: z.object({ x: z.array(z.number()), perCm3: z.array(z.number()) }).nullable(),
  optimised: z.boolean(),
  /** Shared current / this leg's area, and this leg's own best current density [A/m²]. */
  currentDensity: z.number(),
  ownCurrentDensity: z.number(),
  /** The leg as an engine leg definition (feeds a cascade stage). */
  leg: z.record(z.string(), z.unknown()),
});

/** The stored result of a couple run (the `couple` command's output, SI; plus the search). */
export const coupleResultSchema = z.object({
  hotSide: z.number(),
  coldSide: z.number(),
  deltaT: z.number(),
  heatLoad: z.number(),
  current: z.number(),
  voltage: z.number(),
  power: z.number(),
  cop: z.number().nullable(),
  areaRatio: z.number(),
  objective: z.object({ kind: objectiveSchema, value: z.number() }),
  p: coupleLegResultSchema,
  n: coupleLegResultSchema,
  /** The objective with the legs powered separately, and what one shared current costs (K, W or COP). */
  mismatch: z.object({ separateObjective: z.number(), cost: z.number(), unit: z.enum(['K', 'W', '']) }),
  evaluations: z.number(),
  seconds: z.number(),
});

export const cascadeStageResultSchema = z.object({
  coldSide: z.number(),
  hotSide: z.number(),
  current: z.number(),
  voltage: z.number(),
  power: z.number(),
  heatLoad: z.number(),
  heatRejected: z.number(),
  couples: z.number().int(),
});

/** Heat load against cold-side temperature at the best currents, for a cascade of `stages` stages. */
export const cascadeCurveSchema = z.object({
  stages: z.number().int(),
  points: z.array(z.object({ coldSide: z.number(), heatLoad: z.number(), current: z.array(z.number()), power: z.number() })),
});

/** The stored result of a cascade run (the `cascade` command's output, SI; plus the search). */
export const cascadeResultSchema = z.object({
  hotSide: z.number(),
  coldSide: z.number(),
  deltaT: z.number(),
  heatLoad: z.number(),
  objective: z.enum(['maxDeltaT', 'minPower']),
  wiring: z.enum(['series', 'separate']),
  stages: z.array(cascadeStageResultSchema),
  power: z.number(),
  cop: z.number().nullable(),
  curves: z.array(cascadeCurveSchema),
  evaluations: z.number(),
  seconds: z.number(),
});

/** The search a cooler run made, as leg runs record it. */
export const coolerSearchSchema = z.object({ startsDone: z.number().int(), bestStart: z.number().int(), starts: z.number().int() });

export const coolerSchema = z.object({
  id: idSchema,
  kind: coolerKindSchema,
  name: z.string(),
  notes: z.string(),
  input: coolerInputSchema,
  /** The engine case, resolved from the sources when saved: what a run of it computes. */
  case: z.record(z.string(), z.unknown()),
  createdBy: z.string(),
  createdAt: isoDateTimeSchema,
  updatedAt: isoDateTimeSchema,
});

/** A list entry: no engine case; the latest run's number, state and headline (ΔT [K]) when there is one. */
export const coolerSummarySchema = coolerSchema.omit({ case: true }).extend({
  latestRun: z
    .object({ id: idSchema, number: z.number().int(), state: z.enum(['queued', 'running', 'succeeded', 'failed', 'cancelled']), deltaT: z.number().nullable(), power: z.number().nullable() })
    .nullable(),
});

export const coolersResponseSchema = z.object({ coolers: z.array(coolerSummarySchema) });
export const coolerResponseSchema = z.object({ cooler: coolerSchema });

export type CoupleLegSource = z.infer<typeof coupleLegSourceSchema>;
export type CoupleInput = z.input<typeof coupleInputSchema>;
export type StageSource = z.infer<typeof stageSourceSchema>;
export type StageInput = z.input<typeof stageInputSchema>;
export type CouplesLimit = z.infer<typeof couplesLimitSchema>;
export type CascadeInput = z.input<typeof cascadeInputSchema>;
export type CoolerInput = z.input<typeof coolerInputSchema>;
export type CoolerKind = z.infer<typeof coolerKindSchema>;
export type CoupleRunResult = z.infer<typeof coupleResultSchema>;
export type CascadeRunResult = z.infer<typeof cascadeResultSchema>;
export type Cooler = z.infer<typeof coolerSchema>;
export type CoolerSummary = z.infer<typeof coolerSummarySchema>;

/**
 * `GET /api/runs/:id` of a couple or cascade run (a leg run answers
 * runDetailSchema): the frozen cooler and case, progress, trace and result
 * (coupleResultSchema or cascadeResultSchema by `run.kind`, plus `search`).
 */
export const coolerRunDetailSchema = z.object({
  run: runSummarySchema,
  cooler: coolerSchema,
  case: z.record(z.string(), z.unknown()),
  progress: runProgressSchema.nullable(),
  trace: z.array(tracePointSchema),
  traceTotal: z.number().int(),
  result: z.record(z.string(), z.unknown()).nullable(),
  engineVersion: z.string(),
});

/** Either kind of run detail, told apart by `run.kind`. */
export const anyRunDetailSchema = z.union([coolerRunDetailSchema, runDetailSchema]);

export type CoolerRunDetail = z.infer<typeof coolerRunDetailSchema>;
export type AnyRunDetail = z.infer<typeof anyRunDetailSchema>;
