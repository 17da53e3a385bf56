import { growthMailJobSchema } from '../shared/api/growth-mail';
import { sendGrowthMail, type GrowthMailDeps } from '../server/mail/growth-mail';

/**
 * One growth-mail job: checked against the shared schema (it crossed a
 * process boundary), then sent. A failure (the mail server is down) throws,
 * and pg-boss retries the job with backoff.
 */
export async function growthMailJob(d: GrowthMailDeps, data: unknown): Promise<string> {
  return sendGrowthMail(d, growthMailJobSchema.parse(data));
}
