import { isDatabaseUnavailable } from './db-errors';

/**
 * The 'error' listener every pg Pool and Client of ours needs: without one,
 * an idle connection closed by a PostgreSQL restart (57P01) is an unhandled
 * 'error' event that kills the process. The pool drops the broken client by
 * itself and opens a fresh one on the next query; all that is left is to say
 * so, once per outage rather than once per pooled connection.
 */
export function quietPoolErrors(source: string, quietForMs = 10_000): (err: Error) => void {
  let lastLogged = 0;
  return (err) => {
    const now = Date.now();
    if (isDatabaseUnavailable(err) && now - lastLogged < quietForMs) return;
    lastLogged = now;
    console.error(`[${source}] database connection lost: ${err.message}; reconnecting on next use`);
  };
}
