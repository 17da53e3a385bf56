import { z } from 'zod';
import { idSchema } from './common';

/**
 * A job on the growth-mail queue (API → worker): the physicist closed an
 * order, and the grower is told the verdict and its reason. The worker reads
 * the order as it stands, so the mail says what the record says.
 */
export const growthMailJobSchema = z.discriminatedUnion('kind', [z.object({ kind: z.literal('order-closed'), orderId: idSchema })]);

export type GrowthMailJob = z.infer<typeof growthMailJobSchema>;
