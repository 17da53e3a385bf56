import { accountMailJobSchema } from '../shared/api/account-mail';
import { sendAccountMail, type AccountMailDeps } from '../server/mail/account-mail';

/**
 * One account-mail job: checked against the shared schema (it crossed a
 * process boundary), then sent. A failure (the mail server is down) throws,
 * and pg-boss retries the job with backoff.
 */
export async function accountMailJob(d: AccountMailDeps, data: unknown): Promise<string> {
  const job = accountMailJobSchema.parse(data);
  return `${job.kind}: ${await sendAccountMail(d, job)}`;
}
