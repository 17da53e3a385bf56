import type PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import { accountMailJobSchema, type AccountMailJob } from '../../shared/api/account-mail';
import { inTransaction } from '../runs/run-jobs';
import { queues } from './queues';

/** A mail server that is down for a while is retried with backoff: 30 s, 60 s, 120 s, … */
export const mailRetry = { retryLimit: 6, retryDelay: 30, retryBackoff: true } as const;

/**
 * Puts an account mail on its queue for a worker (server/mail/account-mail.ts);
 * with `m`, inside the caller's transaction, so the mail goes out only if the
 * change that asks for it commits.
 */
export async function enqueueAccountMail(boss: PgBoss, job: AccountMailJob, m?: EntityManager): Promise<void> {
  const data = accountMailJobSchema.parse(job);
  const id = await boss.send(queues.accountMail, data, { ...mailRetry, ...(m ? inTransaction(m) : {}) });
  if (!id) throw new Error(`pg-boss did not create an ${data.kind} mail job`);
}
