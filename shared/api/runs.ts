import { z } from 'zod';
import { idSchema, isoDateTimeSchema } from './common';
import { designSchema } from './designs';

/** What a run optimises: one leg (from a design), a matched couple or a cascade (from a cooler, see coolers.ts). */
export const runKindSchema = z.enum(['leg', 'couple', 'cascade']);

export const runStateSchema = z.enum(['queued', 'running', 'succeeded', 'failed', 'cancelled']);

/**
 * The start a multi-start search is working on: its place in the search and
 * its own best point so far (not the run's best, which may come from an
 * earlier start).
 */
export const runStartProgressSchema = z.object({
  /** 1 = the first start. */
  number: z.number().int().min(1),
  of: z.number().int().min(1),
  /** Best objective of this start so far, and the current it is at. */
  best: z.number(),
  current: z.number().nullable(),
});

/** Latest progress of a running optimisation (also the socket event `run:progress`). */
export const runProgressSchema = z.object({
  runId: idSchema,
  phase: z.string(),
  iteration: z.number().int(),
  /** Objective at the latest point and best so far over every start: ΔT [K], heat load [W] or COP. */
  objective: z.number(),
  best: z.number(),
  /** The current [A] of the design that holds `best`; null when unknown (progress stored before it was reported). */
  bestCurrent: z.number().nullable().default(null),
  /** The start being searched; null when unknown (progress stored before starts were reported). */
  start: runStartProgressSchema.nullable().default(null),
  /** Best doping profile of the start being searched: fractions from the cold end, cm⁻³. */
  doping: z.object({ x: z.array(z.number()), perCm3: z.array(z.number()) }).nullable(),
  /** Estimated fraction of the work done, 0–1 (an estimate: optimisers stop when converged). */
  fractionDone: z.number().min(0).max(1),
  evaluations: z.number().int(),
  elapsedSeconds: z.number(),
  at: isoDateTimeSchema,
});

/** Where a queued run stands and why it waits, in words for the user. */
export const runWaitingSchema = z.object({
  /** 1 = next to start. Other teams' runs are counted, never named. */
  position: z.number().int().min(1),
  reason: z.string(),
});

/**
 * Where a finished run's profile stands against bipolar conduction (two-band
 * families only): the largest share of the current minority carriers carry
 * along the leg, and where. `bipolar` is share > 5 %.
 */
export const runBipolarSchema = z.object({
  share: z.number().min(0).max(1),
  x: z.number(),
  temperature: z.number(),
  perCm3: z.number(),
  /** The point is the leg's cold or hot end (else somewhere between). */
  end: z.enum(['cold', 'hot']).nullable(),
  bipolar: z.boolean(),
});

export const runSummarySchema = z.object({
  id: idSchema,
  /** The team's short number for the run ("Run 12"): 1, 2, 3 … in launch order, never reused. */
  number: z.number().int().min(1),
  kind: runKindSchema.default('leg'),
  /** The leg design a leg run ran; null for couple and cascade runs. */
  designId: idSchema.nullable(),
  /** The cooler (couple or cascade) a couple or cascade run ran; null for leg runs. */
  coolerId: idSchema.nullable().default(null),
  /** The design's or the cooler's name. */
  designName: z.string(),
  sweepId: idSchema.nullable(),
  sweepValue: z.number().nullable(),
  state: runStateSchema,
  objective: z.string(),
  /** Best objective (final when finished). */
  best: z.number().nullable(),
  deltaT: z.number().nullable(),
  fractionDone: z.number(),
  /** Search starts the run was launched with (the multi-start search's size). */
  starts: z.number().int().min(1),
  /** Display name of who launched it. */
  launchedBy: z.string(),
  createdAt: isoDateTimeSchema,
  startedAt: isoDateTimeSchema.nullable(),
  finishedAt: isoDateTimeSchema.nullable(),
  error: z.string().nullable(),
  attempts: z.number().int(),
  /** Set while the run is queued. */
  waiting: runWaitingSchema.nullable(),
  /** Minority carriers along the result's profile; null without a result or for a family with no minority band. */
  bipolar: runBipolarSchema.nullable(),
});

export const runsResponseSchema = z.object({ runs: z.array(runSummarySchema) });

export const tracePointSchema = z.object({ iteration: z.number().int(), objective: z.number(), best: z.number(), seconds: z.number() });
/** Points of the trace shown with a run; a run of hours writes tens of thousands. */
export const traceShownMax = 400;
/** Largest page of `GET /api/runs/:id/trace`. */
export const tracePageMax = 2000;

/** `GET /api/runs/:id/trace?offset=&limit=`: the full progress trace, in bounded pages, oldest first. */
export const tracePageQuerySchema = z.object({
  offset: z.coerce.number({ error: 'offset must be a whole number' }).int({ error: 'offset must be a whole number' }).min(0, { error: 'offset must be 0 or more' }).default(0),
  limit: z.coerce.number({ error: 'limit must be a whole number' }).int({ error: 'limit must be a whole number' }).min(1, { error: 'limit must be at least 1' }).max(tracePageMax, { error: `limit must be at most ${tracePageMax}` }).default(500),
});
export const tracePageSchema = z.object({ total: z.number().int(), offset: z.number().int(), points: z.array(tracePointSchema) });

/** A stored leg run (kind "leg"; couple and cascade runs: coolerRunDetailSchema in coolers.ts): the frozen design and case it ran, its progress trace and its result (engine output). */
export const runDetailSchema = z.object({
  run: runSummarySchema,
  design: designSchema,
  /** The engine case, exactly as run (SI; doping cm⁻³). */
  case: z.record(z.string(), z.unknown()),
  familyVersion: z.number().int(),
  progress: runProgressSchema.nullable(),
  /** The progress trace thinned to at most `traceShownMax` points (first and last kept); all of it page by page at /api/runs/:id/trace. */
  trace: z.array(tracePointSchema),
  traceTotal: z.number().int(),
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

export type RunKind = z.infer<typeof runKindSchema>;
export type RunState = z.infer<typeof runStateSchema>;
export type RunProgress = z.infer<typeof runProgressSchema>;
export type RunStartProgress = z.infer<typeof runStartProgressSchema>;
export type RunSummary = z.infer<typeof runSummarySchema>;
export type RunWaiting = z.infer<typeof runWaitingSchema>;
export type RunBipolar = z.infer<typeof runBipolarSchema>;
export type TracePage = z.infer<typeof tracePageSchema>;
export type RunDetail = z.infer<typeof runDetailSchema>;
export type SweepRequest = z.infer<typeof sweepRequestSchema>;
export type Sweep = z.infer<typeof sweepSchema>;
