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

export const sheetStepSchema = z.object({
  zones: z.number().int(),
  value: z.number(),
  deltaT: z.number(),
  current: z.number(),
  rows: z.array(sheetZoneSchema),
});

export const growthSheetSchema = z.object({
  unit: z.enum(['K', 'W', '']),
  lossBudget: z.number(),
  measureTemperature: z.number(),
  lengthMm: z.number(),
  minZoneMm: z.number(),
  continuous: z.object({ value: z.number(), deltaT: z.number() }),
  steps: z.array(sheetStepSchema).min(1),
});

const score = z.object({ value: z.number(), deltaT: z.number(), feasible: z.boolean() });

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
      disagree: z.boolean(),
      outOfRange: z.boolean(),
    }),
  ),
  verdicts: z.array(
    z.object({
      zone: z.number().int(),
      measured: z.number().nullable(),
      verdict: z.enum(['within', 'low', 'high', 'unmeasured']),
      points: z.number().int(),
    }),
  ),
  target: z.object({ value: z.number(), deltaT: z.number(), current: z.number() }),
  asGrown: z.object({ atDesignCurrent: score, atBestCurrent: score.extend({ current: z.number() }) }),
  warnings: z.array(z.string()),
  /** What the CSV reader noticed (ignored columns, suspicious units), stored with the report. */
  uploadWarnings: z.array(z.object({ line: z.number().optional(), column: z.string().optional(), message: z.string() })).optional(),
});

export type SheetZone = z.infer<typeof sheetZoneSchema>;
export type SheetStep = z.infer<typeof sheetStepSchema>;
export type SheetView = z.infer<typeof growthSheetSchema>;
export type ReportView = z.infer<typeof measurementReportSchema>;
export type ZoneVerdictView = ReportView['verdicts'][number];
export type InferredPointView = ReportView['points'][number];

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
