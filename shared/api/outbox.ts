import { z } from 'zod';
import { isoDateTimeSchema } from './common';

/** One e-mail captured by the local mail catcher (development and test only). */
export const outboxMessageSchema = z.object({
  id: z.string().min(1),
  receivedAt: isoDateTimeSchema,
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
});

/** `GET /api/outbox` — 404 `{ name: "NotFound" }` in production. */
export const outboxResponseSchema = z.object({
  messages: z.array(outboxMessageSchema),
});

export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
export type OutboxResponse = z.infer<typeof outboxResponseSchema>;
