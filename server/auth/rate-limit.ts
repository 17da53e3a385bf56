import type { DataSource } from 'typeorm';
import { HttpError } from '../http/errors';

export type Limit = { key: string; max: number; windowSeconds: number };

/**
 * Counts attempts per key in PostgreSQL (so several API processes share the
 * count) and refuses with 429 once a window is full. The hit is recorded
 * before the check, so a burst cannot slip through between two reads.
 */
export async function consume(ds: DataSource, limits: Limit[]): Promise<void> {
  for (const l of limits) {
    const [row] = await ds.query(
      `WITH hit AS (INSERT INTO rate_limit_hit (key) VALUES ($1))
       SELECT count(*)::int + 1 AS n FROM rate_limit_hit WHERE key = $1 AND at > now() - make_interval(secs => $2)`,
      [l.key, l.windowSeconds],
    );
    if ((row as { n: number }).n > l.max) {
      const minutes = Math.ceil(l.windowSeconds / 60);
      throw new HttpError(429, `Too many attempts; try again in ${minutes} minutes.`, undefined, 'TooManyRequests');
    }
  }
  // Old hits are useless; trim them now and then rather than on every call.
  if (Math.random() < 0.02) await ds.query(`DELETE FROM rate_limit_hit WHERE at < now() - interval '1 day'`);
}
