import { z } from 'zod';
import { idSchema, isoDateTimeSchema } from './common';
import { designSchema } from './designs';

export const runStateSchema = z.enum(['queued', 'running', 'succeeded', 'failed', 'cancelled']);

/** Latest progress of a running optimisation (also the socket event `run:progress`). */
export const runProgressSchema = z.object({
  runId: idSchema,
  phase: z.string(),
  iteration: z.number().int(),
  /** Objective at the latest point and best so far: ΔT [K], heat load [W] or COP. */
  objective: z.number(),
  best: z.number(),
  /** Best doping profile so far: fractions from the cold end, cm⁻³. */
  doping: z.object({ x: z.array(z.number()), perCm3: z.array(z.number()) }).nullable(),
  current: z.number().nullable(),
  /** Estimated fraction of the work done, 0–1 (an estimate: optimisers stop when converged). */
  fractionDone: z.number().min(0).max(1),
  evaluations: z.number().int(),
  elapsedSeconds: z.number(),
  at: isoDateTimeSchema,
});

export const runSummarySchema = z.object({
  id: idSchema,
  designId: idSchema,
  designName: z.string(),
  sweepId: idSchema.nullable(),
  sweepValue: z.number().nullable(),
  state: runStateSchema,
  objective: z.string(),
  /** Best objective (final when finished). */
  best: z.number().nullable(),
  deltaT: z.number().nullable(),
  fractionDone: z.number(),
  launchedBy: z.string(),
  createdAt: isoDateTimeSchema,
  startedAt: isoDateTimeSchema.nullable(),
  finishedAt: isoDateTimeSchema.nullable(),
  error: z.string().nullable(),
  attempts: z.number().int(),
});

export const runsResponseSchema = z.object({ runs: z.array(runSummarySchema) });

/** A stored run: the frozen design and case it ran, its progress trace and its result (engine output). */
export const runDetailSchema = z.object({
  run: runSummarySchema,
  design: designSchema,
  /** The engine case, exactly as run (SI; doping cm⁻³). */
  case: z.record(z.string(), z.unknown()),
  familyVersion: z.number().int(),
  progress: runProgressSchema.nullable(),
  trace: z.array(z.object({ iteration: z.number().int(), objective: z.number(), best: z.number(), seconds: z.number() })),
  /** The engine's OptimizeResult (see shared/engine); null until finished (or cancelled with a best-so-far). */
  result: z.record(z.string(), z.unknown()).nullable(),
  engineVersion: z.string(),
});

export const sweepParameterSchema = z.enum(['hotSide', 'lengthMm', 'heatLoad', 'maxPerCm3', 'minPerCm3']);
export const sweepRequestSchema = z.strictObject({
  parameter: sweepParameterSchema,
  values: z.array(z.number({ error: 'values must be numbers' }).refine(Number.isFinite, { error: 'values must be finite numbers' })).min(2, { error: 'a sweep needs at least 2 values' }).max(40, { error: 'a sweep has at most 40 values' }),
});
export const sweepSchema = z.object({
  id: idSchema,
  designId: idSchema,
  parameter: sweepParameterSchema,
  values: z.array(z.number()),
  createdAt: isoDateTimeSchema,
  runs: z.array(runSummarySchema),
});

export type RunState = z.infer<typeof runStateSchema>;
export type RunProgress = z.infer<typeof runProgressSchema>;
export type RunSummary = z.infer<typeof runSummarySchema>;
export type RunDetail = z.infer<typeof runDetailSchema>;
export type SweepRequest = z.infer<typeof sweepRequestSchema>;
export type Sweep = z.infer<typeof sweepSchema>;
