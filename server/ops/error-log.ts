/**
 * Errors a person must look at (a 500, a crash), written so that whoever
 * runs the server can find them: in production one JSON object per line on
 * standard error (time, level, source, message, error name and stack, and
 * the request when there is one), for a log collector to index; elsewhere
 * readable text.
 */
export function logError(source: string, message: string, err?: unknown, fields: Record<string, unknown> = {}): void {
  const e = err instanceof Error ? err : err === undefined ? undefined : new Error(String(err));
  if (process.env.NODE_ENV === 'production') {
    process.stderr.write(`${JSON.stringify({ time: new Date().toISOString(), level: 'error', source, message, ...fields, ...(e ? { error: e.name, detail: e.message, stack: e.stack } : {}) })}\n`);
    return;
  }
  const context = Object.entries(fields).map(([k, v]) => `${k}=${String(v)}`).join(' ');
  process.stderr.write(`[${source}] ${message}${context ? ` (${context})` : ''}${e ? `: ${e.stack ?? e.message}` : ''}\n`);
}
