import { isDatabaseUnavailable } from '../db/db-errors';
import { logError } from './error-log';

/**
 * Last-resort handlers for a long-running process (API, worker, mail
 * catcher). A promise rejected with nobody listening — pg-boss completes a
 * job without awaiting it, so a database restart at that instant rejects in
 * the void — is logged, not fatal: the state it concerned is repaired by the
 * run sweeper. A thrown exception nobody caught leaves the process in an
 * unknown state, so it exits and `npm start`'s supervisor starts it again.
 */
export function installProcessGuards(source: string): void {
  let lastQuiet = 0;
  process.on('unhandledRejection', (reason) => {
    if (isDatabaseUnavailable(reason)) {
      if (Date.now() - lastQuiet < 10_000) return;
      lastQuiet = Date.now();
    }
    logError(source, 'unhandled rejection (kept running)', reason);
  });
  process.on('uncaughtException', (err) => {
    logError(source, 'uncaught exception; exiting so the supervisor restarts this process', err);
    process.exit(70);
  });
}

/**
 * Runs a start-up step that needs the database, waiting for it with backoff
 * while it is unavailable (a process may start before PostgreSQL is back).
 * Any other error is thrown at once.
 */
export async function whenDatabaseAnswers<T>(source: string, what: string, step: () => Promise<T>): Promise<T> {
  let logged = false;
  for (let delay = 500; ; delay = Math.min(5000, delay * 2)) {
    try {
      return await step();
    } catch (err) {
      if (!isDatabaseUnavailable(err)) throw err;
      if (!logged) console.error(`[${source}] ${what}: database unavailable (${err instanceof Error ? err.message : String(err)}); waiting for it`);
      logged = true;
      await new Promise((r) => setTimeout(r, delay));
    }
  }
}
