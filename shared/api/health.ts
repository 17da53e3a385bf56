import { z } from 'zod';

export const healthCheckSchema = z.object({
  ok: z.boolean(),
  detail: z.string(),
});

/** The dependencies the API reports on, in display order. */
export const healthCheckNames = ['database', 'queue', 'worker', 'mail', 'events'] as const;
export type HealthCheckName = (typeof healthCheckNames)[number];

/**
 * `GET /api/health`. The same body may come with 200 (ok) or 503
 * (degraded); the client accepts both.
 */
export const healthResponseSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  version: z.string(),
  checks: z.object({
    database: healthCheckSchema,
    queue: healthCheckSchema,
    worker: healthCheckSchema,
    mail: healthCheckSchema,
    /** The API's relay of live events to browsers (absent where no sockets are served). */
    events: healthCheckSchema.optional(),
  }),
});

export type HealthCheck = z.infer<typeof healthCheckSchema>;
export type HealthResponse = z.infer<typeof healthResponseSchema>;
