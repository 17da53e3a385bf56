/**
 * The shape of a leg case (what `leg solve|optimize FILE`, the API and the
 * design form accept), as zod schemas so server and client validate the
 * same way. Units: SI, except doping in cm⁻³ (`perCm3`) and mobility in
 * cm²/(V·s). Plausibility limits catch unit slips (a length in mm, a Seebeck
 * coefficient in µV/K, a doping in m⁻³) with a message saying so.
 * Cross-field rules (fractions summing to 1, table ranges, which fields each
 * objective needs) are in check-case.ts.
 */
import { z } from 'zod';
import { contactResistivitySchema, parasiticSchema } from './leg-ends';
import { tableBreach } from './table-limits';

export { contactResistivitySchema, parasiticSchema };

/** Doping range accepted anywhere [cm⁻³]; a value 10⁶ off (m⁻³ typed as cm⁻³) lands outside. */
export const MIN_PER_CM3 = 1e14;
export const MAX_PER_CM3 = 1e22;

const number = (what: string) => z.number({ error: (issue) => (issue.input === undefined ? `${what} is required` : `${what} must be a finite number`) });

const positive = (what: string, max: number, unitHint: string) =>
  number(what)
    .gt(0, { error: `${what} must be greater than 0` })
    .max(max, { error: `${what} above ${max} is implausible: ${unitHint}` });

const temperature = (what: string) => positive(what, 5000, 'temperatures are in kelvin');

const doping = (what: string) =>
  number(what)
    .min(MIN_PER_CM3, { error: `${what} must be at least ${MIN_PER_CM3} cm⁻³ (doping is in cm⁻³; a value in m⁻³ is 10⁶ too large, one in per-mm³ too small)` })
    .max(MAX_PER_CM3, { error: `${what} must be at most ${MAX_PER_CM3} cm⁻³ (doping is in cm⁻³; a value in m⁻³ is 10⁶ too large)` });

const seebeck = (what: string) =>
  number(what)
    .refine((v) => v !== 0, { error: `${what} must not be zero` })
    .refine((v) => Math.abs(v) <= 0.01, { error: `${what} beyond ±0.01 V/K is implausible: the Seebeck coefficient is in V/K (200 µV/K = 2e-4)` });

const sigma = (what: string) => positive(what, 1e9, 'the electrical conductivity is in S/m (1000 S/cm = 1e5 S/m)');
const kappa = (what: string) => positive(what, 1e4, 'the thermal conductivity is in W/(m·K)');

export const segmentSchema = z.strictObject({
  fraction: number('fraction').gt(0, { error: 'fraction must be greater than 0' }).max(1, { error: 'fraction must be at most 1' }),
  seebeck: seebeck('seebeck'),
  sigma: sigma('sigma'),
  kappa: kappa('kappa'),
});

export const tableRowSchema = z.strictObject({
  perCm3: doping('perCm3'),
  temperature: temperature('temperature'),
  seebeck: seebeck('seebeck'),
  sigma: sigma('sigma'),
  kappa: kappa('kappa'),
});

/** Temperature [K] up to which a minority band's gap Eg0 − β·T must stay open: coolers reject heat near room temperature. */
export const GAP_OPEN_TO = 300;

/**
 * The minority band of a two-band (bipolar) band model. The gap is in eV
 * and its slope in eV/K, the units of the handbooks; a gap typed in meV
 * (150 for 0.15 eV) lands above the plausibility limit.
 */
export const minorityBandSchema = z
  .strictObject(
    {
      effectiveMass: positive('effectiveMass', 100, 'the effective mass is in units of the free-electron mass'),
      mobility300: positive('mobility300', 1e6, 'the mobility is in cm²/(V·s)'),
      mobilityExponent: number('mobilityExponent').min(-10).max(10),
      bandGap: positive('bandGap', 10, 'the band gap is in eV at 0 K (bismuth telluride ≈ 0.2 eV); a value in meV is 1000 too large'),
      bandGapSlope: number('bandGapSlope')
        .min(-0.002, { error: 'bandGapSlope below −0.002 eV/K is implausible: it is β in Eg(T) = Eg0 − β·T, in eV/K (typically 1e-4 to 5e-4)' })
        .max(0.002, { error: 'bandGapSlope above 0.002 eV/K is implausible: it is β in Eg(T) = Eg0 − β·T, in eV/K (typically 1e-4 to 5e-4)' }),
    },
    { error: 'minority must be {effectiveMass, mobility300, mobilityExponent, bandGap, bandGapSlope}' },
  )
  .refine((m) => m.bandGap - m.bandGapSlope * GAP_OPEN_TO > 0, {
    path: ['bandGapSlope'],
    error: `the gap Eg0 − β·T closes below ${GAP_OPEN_TO} K with this bandGap; it must stay open at least up to ${GAP_OPEN_TO} K (is β in eV/K?)`,
  });

export const materialSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('constant'), seebeck: seebeck('seebeck'), sigma: sigma('sigma'), kappa: kappa('kappa') }),
    z.strictObject({
      kind: z.literal('table'),
      rows: z
        .array(tableRowSchema, { error: 'rows must be a list of measured points' })
        .min(4, { error: 'rows needs at least a 2 × 2 grid of measured points' })
        // Row count, then distinct dopings and temperatures (counted by sorting), before the engine builds its grid.
        .superRefine((rows, ctx) => {
          const over = tableBreach(rows);
          if (over) ctx.addIssue({ code: 'custom', message: over.message });
        }),
    }),
    z.strictObject({
      kind: z.literal('band'),
      carrier: z.enum(['p', 'n'], { error: 'carrier must be "p" or "n"' }),
      effectiveMass: positive('effectiveMass', 100, 'the effective mass is in units of the free-electron mass'),
      mobility300: positive('mobility300', 1e6, 'the mobility is in cm²/(V·s)'),
      mobilityExponent: number('mobilityExponent').min(-10).max(10),
      latticeKappa300: kappa('latticeKappa300'),
      latticeKappaExponent: number('latticeKappaExponent').min(-10).max(10),
      /** Optional minority band (two-band, bipolar model); without it, one band as before. */
      minority: minorityBandSchema.optional(),
    }),
  ],
  { error: 'material.kind must be "constant", "table" or "band"' },
);

export const dopingSchema = z.union([doping('doping'), z.strictObject({ x: z.array(number('x')).min(2, { error: 'x needs at least two nodes' }), perCm3: z.array(doping('perCm3')) })], {
  error: 'doping must be a number (cm⁻³) or {x: [fractions from the cold end], perCm3: [...]}',
});


export const caseSchema = z.strictObject({
  /** Free text for people; the engine ignores it. */
  description: z.string({ error: 'description must be text' }).max(2000, { error: 'description is limited to 2000 characters' }).optional(),
  hotSide: temperature('hotSide'),
  length: positive('length', 0.1, 'the length is in metres (a leg is typically 1e-4 to 5e-3 m)'),
  area: positive('area', 1e-2, 'the area is in m² (1 mm² = 1e-6 m²)'),
  heatLoad: number('heatLoad').min(0, { error: 'heatLoad must not be negative' }).max(1e4, { error: 'heatLoad above 1e4 W is implausible for one leg' }).optional(),
  current: number('current').min(0, { error: 'current must not be negative (it is the magnitude in the cooling direction)' }).max(1e4).optional(),
  coldSide: temperature('coldSide').optional(),
  objective: z.enum(['maxDeltaT', 'maxHeatLoad', 'maxCop'], { error: 'objective must be "maxDeltaT", "maxHeatLoad" or "maxCop"' }).optional(),
  segments: z.array(segmentSchema, { error: 'segments must be a list' }).min(1, { error: 'segments needs at least one segment' }).max(50).optional(),
  freeFractions: z.boolean({ error: 'freeFractions must be true or false' }).optional(),
  material: materialSchema.optional(),
  doping: dopingSchema.optional(),
  bounds: z.strictObject({ minPerCm3: doping('minPerCm3'), maxPerCm3: doping('maxPerCm3') }).optional(),
  controlPoints: z
    .number({ error: 'controlPoints must be a whole number' })
    .int({ error: 'controlPoints must be a whole number' })
    .min(2, { error: 'controlPoints must be at least 2 (both ends)' })
    .max(41, { error: 'controlPoints must be at most 41' })
    .optional(),
  monotone: z.boolean({ error: 'monotone must be true or false' }).optional(),
  /** Ω·m²: one number for both junctions, or {cold, hot}; default 0, ideal contacts. */
  contactResistivity: contactResistivitySchema.optional(),
  /** Heat onto the leg besides the load: {heatLoad (W)} and/or {radiation: {emissivity, surroundings (K)}}; default none. */
  parasitic: parasiticSchema.optional(),
});

export type CaseInput = z.infer<typeof caseSchema>;
export type MaterialInput = z.infer<typeof materialSchema>;
export type MinorityBandInput = z.infer<typeof minorityBandSchema>;
