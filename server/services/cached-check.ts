import type { Check } from './health-service';

export type Freshness = { okMs: number; failedMs: number };

/**
 * A check too costly for every request (the SMTP check opens a session with
 * the mail server): each call answers the last result at once and, when it
 * is older than `okMs` (`failedMs` after a failure, so a recovery shows
 * sooner), starts one new check in the background. Only the very first call
 * waits. `run` never rejects (health's `guard` turns errors into checks).
 */
export function cachedCheck(run: () => Promise<Check>, fresh: Freshness): () => Promise<Check> {
  let last: { check: Check; at: number } | null = null;
  let running: Promise<Check> | null = null;
  const refresh = (): Promise<Check> => {
    running ??= run()
      .then((check) => {
        last = { check, at: Date.now() };
        return check;
      })
      .finally(() => {
        running = null;
      });
    return running;
  };
  return async () => {
    if (!last) return refresh();
    const age = Date.now() - last.at;
    if (age >= (last.check.ok ? fresh.okMs : fresh.failedMs)) void refresh();
    return { ok: last.check.ok, detail: `${last.check.detail} (checked ${Math.round(age / 1000)} s ago)` };
  };
}
