import { z } from 'zod';
import { idSchema } from '@/shared/api/common';
import { runStateSchema } from '@/shared/api/runs';

/**
 * `run:state` as the API relays it: one run (`runId`) or a whole sweep
 * (`sweepId`, when it is launched) changed state. Sent to the team's room
 * and to the run's own room.
 */
export const runStateEventSchema = z.object({
  runId: idSchema.optional(),
  sweepId: idSchema.optional(),
  state: runStateSchema,
  error: z.string().nullable().optional(),
});

export type RunStateEvent = z.infer<typeof runStateEventSchema>;

/** Answer to `watch`: whether the room was joined. */
export type WatchAck = { ok: boolean; error?: string };

/** Room of one run, as the server's watch rules name it. */
export const runRoom = (runId: string) => `run:${runId}`;
