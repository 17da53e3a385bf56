import { z } from 'zod';
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
});

export const teamRefSchema = z.object({
  id: z.string().min(1),
  name: z.string().min(1),
});

/** `GET /api/families` — the material families of the caller's team. */
export const familiesResponseSchema = z.object({
  team: teamRefSchema,
  families: z.array(familySummarySchema),
});

export type FamilyKind = z.infer<typeof familyKindSchema>;
export type Carrier = z.infer<typeof carrierSchema>;
export type FamilySummary = z.infer<typeof familySummarySchema>;
export type TeamRef = z.infer<typeof teamRefSchema>;
export type FamiliesResponse = z.infer<typeof familiesResponseSchema>;
