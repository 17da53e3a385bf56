import { z } from 'zod';

const numbers = z.array(z.number());

/**
 * The part of a stored result (the engine's OptimizeResult plus the
 * search's `search` block) that the run pages show. The API sends it as an
 * open record; it is read through this schema so a change in the engine's
 * output is a clear message, not a broken page.
 */
export const runResultSchema = z.object({
  coldSide: z.number(),
  hotSide: z.number(),
  deltaT: z.number(),
  current: z.number(),
  voltage: z.number(),
  power: z.number(),
  heatLoad: z.number(),
  heatRejected: z.number(),
  cop: z.number().nullable(),
  profile: z.object({
    x: numbers,
    temperature: numbers,
    seebeck: numbers,
    sigma: numbers,
    kappa: numbers,
    zT: numbers,
    perCm3: numbers.optional(),
  }),
  accuracy: z.object({
    unknown: z.string(),
    relativeError: z.number(),
    tolerance: z.number(),
    energyBalance: z.number(),
  }),
  objective: z.object({ name: z.string(), value: z.number() }),
  doping: z.object({ x: numbers, perCm3: numbers }).optional(),
  baselines: z
    .object({
      uniform: z.object({ perCm3: z.number().optional(), current: z.number(), deltaT: z.number(), objective: z.number() }),
      localBestZt: z
        .object({
          current: z.number(),
          deltaT: z.number(),
          objective: z.number(),
          doping: z.object({ x: numbers, perCm3: numbers }),
          passes: z.number(),
          converged: z.boolean(),
        })
        .nullable(),
    })
    .nullable(),
  evaluations: z.number(),
  seconds: z.number(),
  stopped: z.boolean(),
  warnings: z.array(z.string()).default([]),
  search: z.object({ starts: z.number(), startsDone: z.number(), bestStart: z.number() }).optional(),
});

export type RunResult = z.infer<typeof runResultSchema>;
export type LegProfileData = RunResult['profile'];

export type ParsedResult = { ok: true; result: RunResult } | { ok: false; message: string } | null;

/** The stored result, checked; null when the run has none (yet). */
export function parseRunResult(raw: Record<string, unknown> | null): ParsedResult {
  if (raw === null) return null;
  const parsed = runResultSchema.safeParse(raw);
  if (parsed.success) return { ok: true, result: parsed.data };
  const issue = parsed.error.issues[0];
  return { ok: false, message: `The stored result has an unexpected shape at ${issue?.path.join('.') || 'its top level'}: ${issue?.message ?? 'unknown'}` };
}
