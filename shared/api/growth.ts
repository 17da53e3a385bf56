import { z } from 'zod';
import { idSchema, isoDateTimeSchema } from './common';

export const growthStateSchema = z.enum(['requested', 'accepted', 'growing', 'grown', 'measured', 'approved', 'rejected']);
/** The states a grower moves an order through, in order. */
export const growerStates = ['requested', 'accepted', 'growing', 'grown', 'measured'] as const;

const zones = z.number({ error: 'zones must be a whole number' }).int({ error: 'zones must be a whole number' }).min(1, { error: 'zones must be 1–12' }).max(12, { error: 'zones must be 1–12' });
const lossBudget = z.number({ error: 'lossBudget must be a number' }).gt(0, { error: 'lossBudget must be greater than 0' }).max(50, { error: 'lossBudget above 50 is not a tolerance' });
/** Decades (1σ) of as-grown doping scatter per zone: 0 is a perfect grower, a decade is no control at all. */
const dopingScatter = z.number({ error: 'dopingScatter must be a number (decades)' }).min(0, { error: 'dopingScatter must be 0–1 decade' }).max(1, { error: 'dopingScatter must be 0–1 decade' });
const measureTemperature = z.number({ error: 'measureTemperature must be a number' }).min(200, { error: 'measureTemperature is in kelvin (200–400 K)' }).max(400, { error: 'measureTemperature is in kelvin (200–400 K)' });

/** `POST /api/runs/:id/release` — a converged run's profile goes to the grower for a batch. */
export const releaseRequestSchema = z.strictObject({
  batch: z.string({ error: 'batch is required' }).trim().min(1, { error: 'batch is required' }).max(120),
  dueDate: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, { error: 'dueDate must be a date like 2027-01-31' }).optional(),
  notes: z.string().trim().max(4000).default(''),
  zones: zones.default(3),
  lossBudget: lossBudget.default(1),
  measureTemperature: measureTemperature.default(300),
  dopingScatter: dopingScatter.default(0.05),
});

/** `PUT /api/growth-orders/:id/sheet` — choose K, the loss budget or the check temperature; the sheet is recomputed. */
export const sheetSettingsSchema = z.strictObject({ zones: zones.optional(), lossBudget: lossBudget.optional(), measureTemperature: measureTemperature.optional() });

/** `PUT /api/growth-orders/:id/yield` — the grower's doping scatter; the yield is recomputed by a worker. */
export const yieldSettingsSchema = z.strictObject({ dopingScatter });

/** The Hall factor a grower may enter on an upload instead of the band model's (multipart field `hallFactor`). */
export const hallFactorSchema = z.coerce
  .number({ error: 'hallFactor must be a number' })
  .min(0.5, { error: 'hallFactor must be 0.5–2 (1 for a degenerate band, 3π/8 ≈ 1.18 for acoustic phonons, non-degenerate)' })
  .max(2, { error: 'hallFactor must be 0.5–2 (1 for a degenerate band, 3π/8 ≈ 1.18 for acoustic phonons, non-degenerate)' });

/** `PUT /api/growth-orders/:id/state` — the grower's next step. */
export const growthStateChangeSchema = z.strictObject({ state: z.enum(['accepted', 'growing', 'grown', 'measured']), note: z.string().trim().max(2000).default('') });

/** `POST /api/growth-orders/:id/close` — the physicist's verdict. */
export const closeOrderSchema = z.strictObject({
  verdict: z.enum(['approved', 'rejected']),
  reason: z.string({ error: 'reason is required' }).trim().min(1, { error: 'reason is required' }).max(2000),
});

export const growthOrderSchema = z.object({
  id: idSchema,
  runId: idSchema,
  /** The released run's number in its team ("Run 12"). */
  runNumber: z.number().int(),
  designName: z.string(),
  batch: z.string(),
  dueDate: z.string().nullable(),
  notes: z.string(),
  state: growthStateSchema,
  closeReason: z.string().nullable(),
  zones: z.number().int(),
  lossBudget: z.number(),
  measureTemperature: z.number(),
  sheetStatus: z.enum(['computing', 'ready', 'failed']),
  sheetError: z.string().nullable(),
  dopingScatter: z.number(),
  /** 'computing' while a worker recomputes the yield at a new scatter; 'failed' with sheetError saying why. */
  yieldStatus: z.enum(['computing', 'ready', 'failed']),
  /** Fraction done (0…1) of the sheet or yield job computing now; null when none is. */
  sheetProgress: z.number().nullable(),
  releasedBy: z.string(),
  createdAt: isoDateTimeSchema,
  updatedAt: isoDateTimeSchema,
});

export const growthEventSchema = z.object({ at: isoDateTimeSchema, by: z.string(), kind: z.string(), fromState: z.string().nullable(), toState: z.string().nullable(), note: z.string() });

/** `GET /api/growth-orders/:id`: `sheet` is shared/growth's GrowthSheet; each report is its MeasurementReport. */
export const growthOrderDetailSchema = z.object({
  order: growthOrderSchema,
  sheet: z.record(z.string(), z.unknown()).nullable(),
  timeline: z.array(growthEventSchema),
  measurements: z.array(z.object({ id: idSchema, uploadedBy: z.string(), uploadedAt: isoDateTimeSchema, temperature: z.number(), report: z.record(z.string(), z.unknown()) })),
});

export const growthOrdersResponseSchema = z.object({ orders: z.array(growthOrderSchema) });

export type GrowthState = z.infer<typeof growthStateSchema>;
export type GrowthOrderDto = z.infer<typeof growthOrderSchema>;
export type GrowthOrderDetail = z.infer<typeof growthOrderDetailSchema>;
export type ReleaseRequest = z.input<typeof releaseRequestSchema>;
