import { z } from 'zod';
import { idSchema, isoDateTimeSchema } from './common';

/** Where a module's leg comes from: a stored run (its optimum or a baseline), or a family at uniform doping. */
export const legSourceSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('run'), runId: idSchema, leg: z.enum(['optimum', 'uniform', 'localBestZt']).default('optimum') }),
  z.strictObject({
    kind: z.literal('family'),
    familyId: idSchema,
    version: z.number().int().min(1).optional(),
    perCm3: z.number({ error: 'perCm3 must be a number' }).min(1e14, { error: 'perCm3 must be at least 1e14 cm⁻³ (doping is in cm⁻³)' }).max(1e22, { error: 'perCm3 must be at most 1e22 cm⁻³ (a value in m⁻³ is 10⁶ too large)' }),
    lengthMm: z.number().gt(0).max(100),
    areaMm2: z.number().gt(0).max(10000),
  }),
], { error: 'a leg source is {kind: "run", runId, leg} or {kind: "family", familyId, perCm3, lengthMm, areaMm2}' });

/**
 * `POST /api/modules`, `PUT /api/modules/:id`: a saved couple or module.
 * Settings use the engine's module case fields (K, A, Ω·m², K/W).
 */
export const moduleInputSchema = z.strictObject({
  name: z.string({ error: 'name is required' }).trim().min(1, { error: 'name is required' }).max(120),
  notes: z.string().trim().max(4000).default(''),
  p: legSourceSchema,
  n: legSourceSchema,
  hotSide: z.number().min(100).max(1000),
  deltaT: z.number().min(0).max(900),
  couples: z.number().int().min(1).max(100000).default(1),
  areaRatio: z.number().gt(0).max(100).optional(),
  contactResistivity: z.number().min(0).max(1e-6).optional(),
  coldPlateResistance: z.number().min(0).max(1e3).optional(),
  hotPlateResistance: z.number().min(0).max(1e3).optional(),
  currentLimit: z.number().gt(0).max(1e4).optional(),
});

export const moduleDesignSchema = z.object({
  id: idSchema,
  name: z.string(),
  notes: z.string(),
  input: moduleInputSchema,
  /** The engine's module case, resolved from the sources (run legs, family definitions): feed it to runModule. */
  case: z.record(z.string(), z.unknown()),
  createdBy: z.string(),
  createdAt: isoDateTimeSchema,
  updatedAt: isoDateTimeSchema,
});

/** A list entry: the saved input and the name of each leg's source (the run's design or the family; null when gone), no engine case. */
export const moduleSummarySchema = moduleDesignSchema.omit({ case: true }).extend({
  sourceNames: z.object({ p: z.string().nullable(), n: z.string().nullable() }),
});

export const modulesResponseSchema = z.object({ modules: z.array(moduleSummarySchema) });
export const moduleResponseSchema = z.object({ module: moduleDesignSchema });

/** `GET /api/modules/:id/curves.csv?versus=current|deltaT`: which curve the file holds. */
export const moduleCsvQuerySchema = z.object({
  versus: z.enum(['current', 'deltaT'], { error: 'versus must be "current" or "deltaT"' }).default('current'),
});
export type ModuleCsvVersus = z.output<typeof moduleCsvQuerySchema>['versus'];

export type LegSource = z.infer<typeof legSourceSchema>;
export type ModuleInput = z.input<typeof moduleInputSchema>;
export type ModuleDesign = z.infer<typeof moduleDesignSchema>;
export type ModuleSummary = z.infer<typeof moduleSummarySchema>;
