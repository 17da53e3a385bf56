import { z } from 'zod';
import { idSchema, isoDateTimeSchema } from './common';

export const parasiticKindSchema = z.enum(['none', 'fixed', 'radiation'], { error: 'parasitic must be none, fixed or radiation' });

export const objectiveSchema = z.enum(['maxDeltaT', 'maxHeatLoad', 'maxCop'], { error: 'objective must be maxDeltaT, maxHeatLoad or maxCop' });

const num = (field: string) => z.number({ error: `${field} must be a number` }).refine(Number.isFinite, { error: `${field} must be a finite number` });

/**
 * A leg design as the physicist enters it, in the trade's units: length in
 * mm, area in mm², temperatures in K, heat load in W, doping in cm⁻³.
 * Cross-field rules (objective needs coldSide, bounds ordered, family
 * carrier) are checked by the server with the engine.
 */
export const designInputSchema = z.strictObject({
  name: z.string({ error: 'name is required' }).trim().min(1, { error: 'name is required' }).max(120),
  notes: z.string().trim().max(4000).default(''),
  familyId: idSchema,
  /** Version of the family; absent = its current version when saved. */
  familyVersion: z.number().int().min(1).optional(),
  lengthMm: num('lengthMm').gt(0, { error: 'lengthMm must be greater than 0' }).max(100, { error: 'lengthMm above 100 mm is implausible for a leg (the length is in mm)' }),
  areaMm2: num('areaMm2').gt(0, { error: 'areaMm2 must be greater than 0' }).max(10000, { error: 'areaMm2 above 10000 mm² is implausible (the area is in mm²)' }),
  hotSide: num('hotSide').min(100, { error: 'hotSide below 100 K is outside what the families describe' }).max(1000, { error: 'hotSide above 1000 K is implausible (temperatures are in kelvin)' }),
  objective: objectiveSchema.default('maxDeltaT'),
  heatLoad: num('heatLoad').min(0, { error: 'heatLoad must not be negative' }).max(1000).default(0),
  coldSide: num('coldSide').min(50).max(1000).optional(),
  minPerCm3: num('minPerCm3').min(1e14, { error: 'minPerCm3 must be at least 1e14 cm⁻³ (doping is in cm⁻³; a value in m⁻³ is 10⁶ too large)' }).max(1e22),
  maxPerCm3: num('maxPerCm3').min(1e14).max(1e22, { error: 'maxPerCm3 must be at most 1e22 cm⁻³ (doping is in cm⁻³; a value in m⁻³ is 10⁶ too large)' }),
  controlPoints: z.number({ error: 'controlPoints must be a whole number' }).int({ error: 'controlPoints must be a whole number' }).min(2, { error: 'controlPoints must be at least 2' }).max(41, { error: 'controlPoints must be at most 41' }).default(11),
  monotone: z.boolean().default(false),
  /**
   * Starting points of the global search: each is a full local optimisation
   * from a different profile, the best wins. More starts, more confidence
   * that the optimum is global, proportionally longer runs.
   */
  starts: z.number({ error: 'starts must be a whole number' }).int({ error: 'starts must be a whole number' }).min(1, { error: 'starts must be at least 1' }).max(5000, { error: 'starts must be at most 5000' }).default(16),
  /** Shortest zone the grower can make, mm (used by the growth sheet's zoning). */
  minZoneMm: num('minZoneMm').min(0).max(100).default(0),
  /**
   * Specific electrical contact resistivity of the cold and the hot junction
   * in µΩ·cm² (1 µΩ·cm² = 1e-10 Ω·m²; good contacts are 1–10). Absent = 0.
   */
  coldContactMicroOhmCm2: num('coldContactMicroOhmCm2').min(0, { error: 'coldContactMicroOhmCm2 must not be negative' }).max(10000, { error: 'coldContactMicroOhmCm2 above 10000 µΩ·cm² is implausible (it is in µΩ·cm²; good contacts are 1–10)' }).default(0),
  hotContactMicroOhmCm2: num('hotContactMicroOhmCm2').min(0, { error: 'hotContactMicroOhmCm2 must not be negative' }).max(10000, { error: 'hotContactMicroOhmCm2 above 10000 µΩ·cm² is implausible (it is in µΩ·cm²; good contacts are 1–10)' }).default(0),
  /** Parasitic heat onto the cold side, per leg: none, a fixed load (W), or radiation onto the leg's sides. */
  parasitic: parasiticKindSchema.default('none'),
  parasiticLoadW: num('parasiticLoadW').min(0, { error: 'parasiticLoadW must not be negative' }).max(10, { error: 'parasiticLoadW above 10 W onto one leg is implausible (it is in watts per leg)' }).default(0),
  emissivity: num('emissivity').min(0, { error: 'emissivity must be between 0 and 1' }).max(1, { error: 'emissivity must be between 0 and 1' }).default(0),
  surroundingsK: num('surroundingsK').gt(0, { error: 'surroundingsK must be greater than 0 K' }).max(2000, { error: 'surroundingsK above 2000 K is implausible (temperatures are in kelvin)' }).optional(),
}).refine((d) => d.maxPerCm3 > d.minPerCm3, { error: 'maxPerCm3 must be greater than minPerCm3', path: ['maxPerCm3'] })
  .refine((d) => d.objective === 'maxDeltaT' || d.coldSide !== undefined, { error: 'coldSide is required for the heat-load and COP objectives', path: ['coldSide'] })
  .refine((d) => d.coldSide === undefined || d.coldSide < d.hotSide, { error: 'coldSide must be below hotSide', path: ['coldSide'] })
  .refine((d) => d.minZoneMm <= d.lengthMm, { error: 'minZoneMm cannot exceed the leg length', path: ['minZoneMm'] })
  .refine((d) => d.parasitic !== 'fixed' || d.parasiticLoadW > 0, { error: 'parasiticLoadW must be greater than 0 for a fixed parasitic load', path: ['parasiticLoadW'] })
  .refine((d) => d.parasitic !== 'radiation' || d.emissivity > 0, { error: 'emissivity must be greater than 0 for radiation', path: ['emissivity'] })
  .refine((d) => d.parasitic !== 'radiation' || d.surroundingsK !== undefined, { error: 'surroundingsK is required for radiation (the temperature of what the leg sees, K)', path: ['surroundingsK'] });

export const designSchema = z.object({
  id: idSchema,
  name: z.string(),
  notes: z.string(),
  familyId: idSchema,
  familyName: z.string(),
  familyVersion: z.number().int(),
  carrier: z.enum(['p', 'n']).nullable(),
  lengthMm: z.number(),
  areaMm2: z.number(),
  hotSide: z.number(),
  objective: objectiveSchema,
  heatLoad: z.number(),
  coldSide: z.number().nullable(),
  minPerCm3: z.number(),
  maxPerCm3: z.number(),
  controlPoints: z.number().int(),
  monotone: z.boolean(),
  starts: z.number().int(),
  minZoneMm: z.number(),
  coldContactMicroOhmCm2: z.number(),
  hotContactMicroOhmCm2: z.number(),
  parasitic: parasiticKindSchema,
  parasiticLoadW: z.number(),
  emissivity: z.number(),
  surroundingsK: z.number().nullable(),
  createdBy: z.string(),
  createdAt: isoDateTimeSchema,
  updatedAt: isoDateTimeSchema,
  /** Whether the caller follows the design (gets its run e-mails). */
  following: z.boolean(),
});

export const designsResponseSchema = z.object({ designs: z.array(designSchema) });
export const designResponseSchema = z.object({ design: designSchema });

export type DesignInput = z.input<typeof designInputSchema>;
export type Design = z.infer<typeof designSchema>;
export type Objective = z.infer<typeof objectiveSchema>;
export type ParasiticKind = z.infer<typeof parasiticKindSchema>;
