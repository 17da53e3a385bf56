import { z } from 'zod';

export const healthCheckSchema = z.object({
  ok: z.boolean(),
  detail: z.string(),
});

/** The dependencies the API reports on, in display order. */
export const healthCheckNames = ['database', 'queue', 'worker', 'mail', 'events'] as const;
export type HealthCheckName = (typeof healthCheckNames)[number];

const status = z.enum(['ok', 'degraded']);

export const healthChecksSchema = z.object({
  database: healthCheckSchema,
  queue: healthCheckSchema,
  worker: healthCheckSchema,
  mail: healthCheckSchema,
  /** The API's relay of live events to browsers (absent where no sockets are served). */
  events: healthCheckSchema.optional(),
});

/**
 * `GET /api/health` as anyone may see it: load balancers and uptime monitors
 * need no more. The version only goes to signed-in members (a stranger gains
 * nothing from it but the exact release to look up flaws for). Strict, so a
 * field that leaks into the public answer fails the schema.
 */
export const publicHealthSchema = z.strictObject({
  status,
  version: z.string().optional(),
});

/**
 * The same answer with every check and its detail, for an admin of any team
 * (the checks describe the installation, not a team) and for the local
 * operator (a request from loopback with no proxy in front).
 */
export const healthDetailsSchema = z.strictObject({
  status,
  version: z.string(),
  checks: healthChecksSchema,
});

/** What a client reads: either answer, with 200 (ok) or 503 (degraded). */
export const healthResponseSchema = z.union([healthDetailsSchema, publicHealthSchema]);

export type HealthCheck = z.infer<typeof healthCheckSchema>;
export type HealthChecks = z.infer<typeof healthChecksSchema>;
export type PublicHealth = z.infer<typeof publicHealthSchema>;
export type HealthDetails = z.infer<typeof healthDetailsSchema>;
export type HealthResponse = z.infer<typeof healthResponseSchema>;
