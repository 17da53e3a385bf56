import type { DataSource } from 'typeorm';
import { RetryLaterError } from '../http/errors';

/** One counter: at most `max` hits of `key` within `windowSeconds`; `what` names it in the refusal. */
export type Limit = { key: string; max: number; windowSeconds: number; what: string };

/** "15 minutes", "an hour", "24 hours": a window in the words of a refusal. */
export function windowWords(seconds: number): string {
  if (seconds === 3600) return 'an hour';
  if (seconds % 3600 === 0) return `${seconds / 3600} hours`;
  return `${Math.round(seconds / 60)} minutes`;
}

/** "try again in 3 minutes", "… in 5 hours" (never "in 0 minutes"). */
export function retryWords(seconds: number): string {
  const minutes = Math.max(1, Math.ceil(seconds / 60));
  if (minutes > 90) return `try again in ${Math.ceil(minutes / 60)} hours`;
  return minutes === 1 ? 'try again in a minute' : `try again in ${minutes} minutes`;
}

/**
 * Counts attempts per key in PostgreSQL (so several API processes share the
 * count) and refuses with 429 once a window is full, naming the limit, with
 * Retry-After set to when the oldest counted attempt leaves the window. The
 * hit is recorded before the check, so a burst cannot slip through between
 * two reads, and refused attempts count too (hammering keeps the door shut).
 */
export async function consume(ds: DataSource, limits: Limit[]): Promise<void> {
  for (const l of limits) {
    const [row] = await ds.query(
      `WITH hit AS (INSERT INTO rate_limit_hit (key) VALUES ($1))
       SELECT count(*)::int + 1 AS n, extract(epoch FROM min(at) + make_interval(secs => $2) - now())::float8 AS left
       FROM rate_limit_hit WHERE key = $1 AND at > now() - make_interval(secs => $2)`,
      [l.key, l.windowSeconds],
    );
    const { n, left } = row as { n: number; left: number | null };
    if (n > l.max) {
      const retryAfter = Math.max(1, Math.ceil(left ?? l.windowSeconds));
      throw new RetryLaterError(429, `Too many attempts: at most ${l.max} ${l.what} in ${windowWords(l.windowSeconds)}; ${retryWords(retryAfter)}.`, undefined, retryAfter);
    }
  }
  // Old hits are useless; trim them now and then rather than on every call.
  if (Math.random() < 0.02) await ds.query(`DELETE FROM rate_limit_hit WHERE at < now() - interval '1 day'`);
}
