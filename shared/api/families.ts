import { z } from 'zod';
import { materialSchema } from '../engine/case-schema';
import { idSchema, isoDateTimeSchema } from './common';

/** How a family describes S, σ and κ as functions of doping and temperature. */
export const familyKindSchema = z.enum(['band', 'table', 'constant']);

/** Majority carrier of the family: holes (p), electrons (n) or not fixed. */
export const carrierSchema = z.enum(['p', 'n']).nullable();

export const familySummarySchema = z.object({
  id: idSchema,
  name: z.string().min(1),
  kind: familyKindSchema,
  carrier: carrierSchema,
  summary: z.string(),
  source: z.string(),
  createdBy: z.string(),
  createdAt: isoDateTimeSchema,
  isDemo: z.boolean(),
  /** The current version number (1, 2, …); every edit adds one. */
  version: z.number().int().min(1),
  archived: z.boolean(),
  updatedAt: isoDateTimeSchema,
});

export const teamRefSchema = z.object({
  id: z.string().min(1),
  name: z.string().min(1),
});

/** `GET /api/families?archived=1` — the material families of the caller's team (archived ones only with the flag). */
export const familiesResponseSchema = z.object({
  team: teamRefSchema,
  families: z.array(familySummarySchema),
});

/** One immutable version of a family: the engine's material object plus provenance. */
export const familyVersionSchema = z.object({
  version: z.number().int().min(1),
  definition: materialSchema,
  summary: z.string(),
  source: z.string(),
  createdBy: z.string(),
  createdAt: isoDateTimeSchema,
  /** Runs that used this version; a version with runs can never change. */
  runCount: z.number().int().min(0),
});

/** `GET /api/families/:id` (current version) and `GET /api/families/:id/versions/:version`. */
export const familyDetailResponseSchema = z.object({
  family: familySummarySchema,
  current: familyVersionSchema,
  versions: z.array(familyVersionSchema.omit({ definition: true })),
});

const text = (field: string, max: number) => z.string({ error: `${field} must be text` }).trim().max(max, { error: `${field} is longer than ${max} characters` });

/** `POST /api/families` (JSON) — a band-model or constant family, or a table sent as JSON rows. */
export const createFamilyRequestSchema = z.strictObject({
  name: text('name', 120).min(1, { error: 'name is required' }),
  summary: text('summary', 2000).default(''),
  source: text('source', 2000).min(1, { error: 'source is required: say where the numbers come from' }),
  definition: materialSchema,
});

/** `PUT /api/families/:id` — any subset; a new version is written when anything but the name changes. */
export const updateFamilyRequestSchema = z.strictObject({
  name: text('name', 120).min(1, { error: 'name must not be empty' }).optional(),
  summary: text('summary', 2000).optional(),
  source: text('source', 2000).min(1, { error: 'source must not be empty' }).optional(),
  definition: materialSchema.optional(),
});

/** `POST /api/families/:id/duplicate`. */
export const duplicateFamilyRequestSchema = z.strictObject({ name: text('name', 120).min(1, { error: 'name is required' }) });

export type FamilyKind = z.infer<typeof familyKindSchema>;
export type Carrier = z.infer<typeof carrierSchema>;
export type FamilySummary = z.infer<typeof familySummarySchema>;
export type TeamRef = z.infer<typeof teamRefSchema>;
export type FamiliesResponse = z.infer<typeof familiesResponseSchema>;
export type FamilyVersion = z.infer<typeof familyVersionSchema>;
export type FamilyDetailResponse = z.infer<typeof familyDetailResponseSchema>;
export type CreateFamilyRequest = z.input<typeof createFamilyRequestSchema>;
export type UpdateFamilyRequest = z.input<typeof updateFamilyRequestSchema>;
