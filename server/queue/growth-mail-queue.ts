import type PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { growthMailJobSchema, type GrowthMailJob } from '../../shared/api/growth-mail';
import { inTransaction } from '../runs/run-jobs';
import { mailRetry } from './account-mail-queue';
import { queues } from './queues';

/**
 * Puts a growth-order mail on its queue for a worker (server/mail/growth-mail.ts),
 * inside the change's transaction: the mail goes out only if the change commits,
 * and the request never waits for the mail server.
 */
export async function enqueueGrowthMail(boss: PgBoss, job: GrowthMailJob, m: EntityManager): Promise<void> {
  const data = growthMailJobSchema.parse(job);
  const id = await boss.send(queues.growthMail, data, { ...mailRetry, ...inTransaction(m) });
  if (!id) throw new Error(`pg-boss did not create an ${data.kind} mail job`);
}
