import type { ErrorRequestHandler, RequestHandler } from 'express';
import { MulterError } from 'multer';
import { isDatabaseUnavailable } from '../db/db-errors';
import { logError } from '../ops/error-log';
import { fieldSentence, wordMessage } from '../../shared/api/field-labels';
import { uniqueConflict } from './unique-conflict';

export type FieldError = { field: string; message: string };

/** Errors that map to an HTTP answer; everything else becomes a 500. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly errors?: FieldError[],
    name = 'HttpError',
  ) {
    super(message);
    this.name = name;
  }
}

export class NotFoundError extends HttpError {
  constructor(what = 'resource') {
    super(404, `No such ${what}.`, undefined, 'NotFound');
  }
}

/**
 * Refused input, field by field. Every message names its field as the form
 * labels it (shared/api/field-labels.ts), whichever service wrote it; the
 * field paths stay schema paths, for forms to put each message beside its input.
 */
export class ValidationError extends HttpError {
  constructor(errors: FieldError[]) {
    const worded = errors.map((e) => ({ field: e.field, message: wordMessage(e.field, e.message) }));
    super(400, worded.map((e) => fieldSentence(e.field, e.message)).join('; '), worded, 'ValidationError');
  }
}

/** A refusal that passes with time (a rate limit, a full queue): the answer says when to try again. */
export class RetryLaterError extends HttpError {
  constructor(status: 429 | 503, message: string, errors: FieldError[] | undefined, readonly retryAfterSeconds: number) {
    super(status, message, errors, status === 429 ? 'TooManyRequests' : 'ServiceUnavailable');
  }
}

/** The server is at capacity for this kind of work (503 with Retry-After); asking again later may succeed. */
export class BusyError extends RetryLaterError {
  constructor(message: string, retryAfterSeconds: number) {
    super(503, message, undefined, retryAfterSeconds);
    this.name = 'Busy';
  }
}

export const notFoundApi: RequestHandler = (req, _res, next) => next(new NotFoundError(`route ${req.method} ${req.path}`));

/**
 * One error shape for every route: { name, message, errors? }. No stack
 * traces in answers; an unexpected error is logged with its request (JSON
 * lines in production), except in the test profile, whose runs check answers.
 */
export function errorHandler(logUnexpected: boolean): ErrorRequestHandler {
  return (err: unknown, req, res, _next) => {
    if (err instanceof HttpError) {
      if (err instanceof RetryLaterError) res.set('Retry-After', String(Math.ceil(err.retryAfterSeconds)));
      res.status(err.status).json({ name: err.name, message: err.message, ...(err.errors ? { errors: err.errors } : {}) });
      return;
    }
    if (isDatabaseUnavailable(err)) {
      // An outage, not a bug: say so plainly, and when to try again.
      res.status(503).set('Retry-After', '5').json({ name: 'ServiceUnavailable', message: 'The database is unavailable for a moment (restarting or unreachable); try again in a few seconds.' });
      return;
    }
    const known = clientError(err);
    if (known) {
      res.status(known.status).json({ name: known.name, message: known.message, errors: known.errors });
      return;
    }
    if (logUnexpected) logError('api', 'unexpected error answered 500', err, { method: req.method, path: req.path, ip: req.ip });
    res.status(500).json({ name: 'InternalError', message: 'Something went wrong on the server; the error has been logged.' });
  };
}

/** Errors raised by body-parser, multer and unique indexes, mapped to the field the user can fix. */
function clientError(err: unknown): HttpError | null {
  if (err instanceof MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'The file is larger than 5 MB.', [{ field: 'file', message: 'too large' }], 'PayloadTooLarge');
    return new HttpError(400, `Upload refused: ${err.message}.`, [{ field: err.field ?? 'file', message: err.message }], 'ValidationError');
  }
  const type = typeof err === 'object' && err !== null ? (err as { type?: unknown }).type : undefined;
  if (type === 'entity.too.large') return new HttpError(413, 'Request body is too large.', [{ field: 'body', message: 'too large' }], 'PayloadTooLarge');
  if (type === 'entity.parse.failed') return new HttpError(400, 'Request body is not valid JSON.', [{ field: 'body', message: 'not valid JSON' }], 'BadRequest');
  if (type === 'charset.unsupported' || type === 'encoding.unsupported') return new HttpError(415, 'Unsupported request encoding.', [{ field: 'body', message: 'unsupported encoding' }], 'UnsupportedMediaType');
  const conflict = uniqueConflict(err);
  if (conflict) return new HttpError(409, `Conflict: ${conflict.message}.`, [conflict], 'Conflict');
  return null;
}
