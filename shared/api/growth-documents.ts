import { z } from 'zod';
import type { GrowthSheet } from '../growth/growth-sheet';
import type { MeasurementReport } from '../growth/measurement-report';

/**
 * The parts of a growth sheet and a measurement report the client reads.
 * `GET /api/growth-orders/:id` carries both as opaque JSON (./growth.ts);
 * these schemas check them before a screen relies on a field.
 */
const pair = z.tuple([z.number(), z.number()]);

export const sheetZoneSchema = z.object({
  index: z.number().int(),
  startMm: z.number(),
  endMm: z.number(),
  perCm3: z.number(),
  lowPerCm3: z.number(),
  highPerCm3: z.number(),
  lowAtBound: z.boolean(),
  highAtBound: z.boolean(),
  lossAtLow: z.number(),
  lossAtHigh: z.number(),
  seebeckUvK: z.number(),
  sigmaSCm: z.number(),
  seebeckBandUvK: pair,
  sigmaBandSCm: pair,
});

/** How a step's bands were made to hold for the whole leg (shared/growth/zone-tolerance.ts). */
export const jointBandCheckSchema = z.object({
  method: z.enum(['all-corners', 'guided-corners']),
  scale: z.number(),
  cornersSolved: z.number().int(),
  worstCornerLoss: z.number(),
  perZoneWorstCornerLoss: z.number(),
});

/** The Monte Carlo of as-grown legs at the grower's scatter (shared/growth/growth-yield.ts). */
export const yieldEstimateSchema = z.object({
  scatterDecades: z.number(),
  samples: z.number().int(),
  seed: z.number().int(),
  meetsBudget: z.number(),
  budget: z.number(),
  target: z.number(),
  mean: z.number(),
  p05: z.number(),
  p50: z.number(),
  p95: z.number(),
  infeasible: z.number().int(),
  histogram: z.object({ edges: z.array(z.number()), counts: z.array(z.number().int()), below: z.number().int().optional() }),
});

export const sheetStepSchema = z.object({
  zones: z.number().int(),
  value: z.number(),
  deltaT: z.number(),
  current: z.number(),
  rows: z.array(sheetZoneSchema),
  // Absent on sheets computed before bands were joint and yields existed; the screen says so.
  joint: jointBandCheckSchema.optional(),
  yield: yieldEstimateSchema.optional(),
});

export const growthSheetSchema = z.object({
  unit: z.enum(['K', 'W', '']),
  lossBudget: z.number(),
  measureTemperature: z.number(),
  dopingScatter: z.number().optional(),
  lengthMm: z.number(),
  minZoneMm: z.number(),
  continuous: z.object({ value: z.number(), deltaT: z.number() }),
  steps: z.array(sheetStepSchema).min(1),
  /** Contacts (Ω·m²) and parasitic heat the sheet was computed with; absent on sheets from before contacts reached the grower's work (computed ideal). */
  ends: z
    .object({
      contacts: z.object({ cold: z.number(), hot: z.number() }).optional(),
      parasitic: z.object({ heatLoad: z.number().optional(), radiation: z.object({ emissivity: z.number(), surroundings: z.number() }).optional() }).optional(),
    })
    .nullable()
    .optional(),
});

const score = z.object({ value: z.number(), deltaT: z.number(), feasible: z.boolean() });

/** One reading of a position against its zone's band (shared/growth/point-verdicts.ts): µV/K, S/cm, or cm⁻³ for Hall. */
export const readingSchema = z.object({
  kind: z.enum(['seebeck', 'sigma', 'hall']),
  value: z.number(),
  low: z.number(),
  high: z.number(),
  verdict: z.enum(['within', 'low', 'high']),
});

export const measurementReportSchema = z.object({
  zones: z.number().int(),
  points: z.array(
    z.object({
      line: z.number().int(),
      positionMm: z.number(),
      perCm3: z.number(),
      fromSeebeck: z.number().nullable(),
      fromSigma: z.number().nullable(),
      fromHall: z.number().nullable(),
      hallPerCm3: z.number().nullable().optional(),
      hallFactor: z.number().nullable().optional(),
      disagree: z.boolean(),
      outOfRange: z.boolean(),
      // Absent on reports stored before each reading was judged; the screen says so.
      zone: z.number().int().optional(),
      readings: z.array(readingSchema).optional(),
    }),
  ),
  verdicts: z.array(
    z.object({
      zone: z.number().int(),
      measured: z.number().nullable(),
      verdict: z.enum(['within', 'low', 'high', 'stray', 'unmeasured']),
      points: z.number().int(),
      readings: z.number().int().optional(),
      readingsOutside: z.number().int().optional(),
    }),
  ),
  target: z.object({ value: z.number(), deltaT: z.number(), current: z.number() }),
  hall: z.object({ source: z.enum(['band-model', 'entered', 'none']), min: z.number(), max: z.number(), note: z.string() }).nullable().optional(),
  asGrown: z.object({ atDesignCurrent: score, atBestCurrent: score.extend({ current: z.number() }) }),
  warnings: z.array(z.string()),
  /** What the CSV reader noticed (ignored columns, suspicious units), stored with the report. */
  uploadWarnings: z.array(z.object({ line: z.number().optional(), column: z.string().optional(), message: z.string() })).optional(),
});

export type SheetZone = z.infer<typeof sheetZoneSchema>;
export type SheetStep = z.infer<typeof sheetStepSchema>;
export type JointBandCheckView = z.infer<typeof jointBandCheckSchema>;
export type YieldView = z.infer<typeof yieldEstimateSchema>;
export type SheetView = z.infer<typeof growthSheetSchema>;
export type ReportView = z.infer<typeof measurementReportSchema>;
export type ZoneVerdictView = ReportView['verdicts'][number];
export type InferredPointView = ReportView['points'][number];
export type ReadingView = z.infer<typeof readingSchema>;

// Compile-time checks: what the server computes fits what the client reads.
const _sheetFits = (s: GrowthSheet): SheetView => s;
const _reportFits = (r: MeasurementReport): ReportView => r;

/** The stored sheet, or null when it is missing or not in the expected shape. */
export function readSheet(raw: unknown): SheetView | null {
  const parsed = growthSheetSchema.safeParse(raw);
  return parsed.success ? parsed.data : null;
}

/** A stored measurement report, or null when it is not in the expected shape. */
export function readReport(raw: unknown): ReportView | null {
  const parsed = measurementReportSchema.safeParse(raw);
  return parsed.success ? parsed.data : null;
}

/** The sentence the sheet (screen, CSV, print) uses to say how its bands were computed. */
export function jointBandNote(joint: JointBandCheckView | undefined, lossBudget: number, unit: string): string {
  const budget = `${lossBudget} ${unit || '(objective units)'}`.trim();
  if (!joint) return `computed one zone at a time (a sheet from before joint bands): each band holds only with every other zone on target; recompute the sheet`;
  const how = joint.method === 'all-corners' ? `corners re-solved: ${joint.cornersSolved}, all of them` : `corners re-solved: ${joint.cornersSolved}, the sign-guided corner and the quadratic model's worst`;
  return `computed jointly: every combination inside the bands keeps the loss ≤ ${budget} (${how}; worst ${(Math.floor(joint.worstCornerLoss * 1000) / 1000).toFixed(3)} ${unit}; one-zone-at-a-time bands scaled by ${joint.scale.toFixed(2)})`;
}

/** What the yield's percentage is of: "of 600 simulated as-grown legs lose ≤ 1 K at a doping scatter of 0.05 decades (1σ) per zone". */
export function yieldBasis(y: YieldView, unit: string): string {
  return `of ${y.samples} simulated as-grown legs lose ≤ ${y.budget} ${unit || '(objective units)'} at a doping scatter of ${y.scatterDecades} decades (1σ) per zone`;
}

/** The yield in one line: percentage, scatter and sample count. */
export function yieldNote(y: YieldView, unit: string): string {
  return `${(100 * y.meetsBudget).toFixed(1)} % ${yieldBasis(y, unit)}`;
}
