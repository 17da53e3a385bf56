/**
 * Telling "the database is not there right now" apart from "this query is
 * wrong". The first is an ordinary fault (a restart, a failover, a network
 * blip): callers answer 503 or retry later. The second is a bug or bad input.
 */

/** SQLSTATE classes and codes that mean the server or the connection went away. */
const unavailableCodes = new Set([
  '57P01', // admin_shutdown: pg_ctl stop / restart -m fast
  '57P02', // crash_shutdown
  '57P03', // cannot_connect_now: starting up or shutting down
  '53300', // too_many_connections
  'ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENETUNREACH', 'ENOTFOUND', 'EAI_AGAIN',
]);

/** node-postgres reports a dropped socket only in words. */
const unavailableMessages = [
  'Connection terminated',
  'connection timeout',
  'timeout exceeded when trying to connect',
  'Client has encountered a connection error',
  'Client was closed and is not queryable',
  'terminating connection due to administrator command',
  'the database system is',
  'Cannot use a pool after calling end',
];

function codeOf(err: object): string | undefined {
  const own = (err as { code?: unknown }).code;
  if (typeof own === 'string') return own;
  // TypeORM wraps driver errors in QueryFailedError { driverError }.
  const driver = (err as { driverError?: unknown }).driverError;
  if (driver && typeof driver === 'object') return codeOf(driver);
  return undefined;
}

/**
 * TypeORM's words for a transaction whose connection died under it: the
 * driver released the broken connection, and the transaction's next query
 * finds it gone. Seen only when PostgreSQL went away mid-request.
 */
const releasedRunner = new Set(['QueryRunnerAlreadyReleasedError', 'QueryRunnerProviderAlreadyReleasedError']);

export function isDatabaseUnavailable(err: unknown): boolean {
  if (!err || typeof err !== 'object') return false;
  if (err instanceof Error && releasedRunner.has(err.name)) return true;
  const code = codeOf(err);
  if (code && (unavailableCodes.has(code) || code.startsWith('08'))) return true;
  const message = err instanceof Error ? err.message : '';
  if (unavailableMessages.some((m) => message.includes(m))) return true;
  const cause = (err as { cause?: unknown }).cause;
  return cause !== undefined && cause !== err && isDatabaseUnavailable(cause);
}

/**
 * Logs a recurring fault once when it starts and once when it ends, instead of
 * every few hundred milliseconds while PostgreSQL is away.
 */
export function outageLog(source: string): { failed: (what: string, err: unknown) => void; ok: () => void; since: () => number | null } {
  let down: number | null = null;
  return {
    failed(what, err) {
      if (down !== null) return;
      down = Date.now();
      const message = err instanceof Error ? err.message : String(err);
      console.error(`[${source}] ${what} failed: ${message}${isDatabaseUnavailable(err) ? ' (database unavailable; retrying quietly until it is back)' : ''}`);
    },
    ok() {
      if (down === null) return;
      console.log(`[${source}] database reachable again after ${((Date.now() - down) / 1000).toFixed(1)} s`);
      down = null;
    },
    since: () => down,
  };
}
