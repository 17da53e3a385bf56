import { z } from 'zod';
import { familySummarySchema } from './families';

/** A problem or a remark about an uploaded table, located where the user can find it. */
export const uploadIssueSchema = z.object({
  /** 1-based line in the file (the header is line 1); absent for whole-file remarks. */
  line: z.number().int().min(1).optional(),
  /** The column header as written in the file. */
  column: z.string().optional(),
  message: z.string(),
});

/** A recognised column: what it measures, the unit read from its header, how it was converted. */
export const uploadColumnSchema = z.object({
  header: z.string(),
  quantity: z.enum(['perCm3', 'temperature', 'seebeck', 'sigma', 'resistivity', 'kappa']),
  unit: z.string(),
  /** Factor (and offset, for °C) applied to reach the engine's unit. */
  toEngine: z.string(),
});

export const uploadRowSchema = z.object({
  line: z.number().int(),
  perCm3: z.number(),
  temperature: z.number(),
  /** Engine units: V/K, S/m, W/(m·K). */
  seebeck: z.number(),
  sigma: z.number(),
  kappa: z.number(),
});

/** The first missing grid points a preview names; the rest are counted in `holes`. */
export const holesListed = 5;

/**
 * Largest grid (dopings × temperatures) whose cell-by-cell `present` map a
 * preview carries: 50 × 50 draws comfortably on a page (a full campaign of
 * 30 dopings × 40 temperatures is 1,200 cells); larger grids are described by
 * their counts and first holes.
 */
export const coverageDrawLimit = 2500;

/** Which doping × temperature points a file holds. */
export const uploadCoverageSchema = z.object({
  dopings: z.array(z.number()),
  temperatures: z.array(z.number()),
  /** Grid points the file holds (a duplicate counts once). */
  measured: z.number().int().min(0),
  /** dopings × temperatures − measured: counted, never listed in full. */
  holes: z.number().int().min(0),
  /** The first `holesListed` missing points, doping by doping. */
  firstHoles: z.array(z.object({ perCm3: z.number(), temperature: z.number() })),
  /** `present[i][j]`: doping i was measured at temperature j; null when the grid has more than `coverageDrawLimit` cells. */
  present: z.array(z.array(z.boolean())).nullable(),
});

/**
 * `POST /api/families/upload/preview` (multipart: `file`) — nothing is saved.
 * A file over a size cap (5 MB, `tableLimits` rows, distinct dopings or
 * temperatures) is refused with 400/413 naming the field `file`; any other
 * problem comes back here, in `errors`, located by line and column.
 */
export const uploadPreviewSchema = z.object({
  ok: z.boolean(),
  rowCount: z.number().int(),
  columns: z.array(uploadColumnSchema),
  rows: z.array(uploadRowSchema),
  carrier: z.enum(['p', 'n']).nullable(),
  coverage: uploadCoverageSchema,
  warnings: z.array(uploadIssueSchema),
  errors: z.array(uploadIssueSchema),
});

/**
 * `POST /api/families/upload` (multipart: `file`, `name`, `source`, `summary`)
 * saves all or nothing: 201 with the family, or 400 with the preview's errors.
 */
export const uploadSavedSchema = z.object({ family: familySummarySchema, preview: uploadPreviewSchema });

/** Largest accepted upload, in bytes; larger files are refused before they are read. */
export const maxUploadBytes = 5 * 1024 * 1024;

export type UploadIssue = z.infer<typeof uploadIssueSchema>;
export type UploadColumn = z.infer<typeof uploadColumnSchema>;
export type UploadRow = z.infer<typeof uploadRowSchema>;
export type UploadPreview = z.infer<typeof uploadPreviewSchema>;
export type UploadCoverage = z.infer<typeof uploadCoverageSchema>;
export type UploadSaved = z.infer<typeof uploadSavedSchema>;
