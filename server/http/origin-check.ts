import type { RequestHandler } from 'express';
import { HttpError } from './errors';

const safe = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests whose Origin is not the app's own (or, in
 * development, a loopback dev server): the session cookie alone must never be
 * enough for another site to act for a signed-in user.
 */
export function originCheck(appOrigin: string, allowLoopback: boolean): RequestHandler {
  const own = new URL(appOrigin).origin;
  return (req, _res, next) => {
    if (safe.has(req.method)) return next();
    const origin = req.get('origin');
    const ok = origin === own || (allowLoopback && !!origin && /^http:\/\/(127\.0\.0\.1|localhost):\d+$/.test(origin));
    next(ok ? undefined : new HttpError(403, origin ? `Requests from ${origin} are not accepted.` : 'The Origin header is missing; requests that change data must come from the Frostgrade app.', undefined, 'Forbidden'));
  };
}
