import type { ErrorRequestHandler, RequestHandler } from 'express';

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

export class ValidationError extends HttpError {
  constructor(errors: FieldError[]) {
    super(400, errors.map((e) => `${e.field}: ${e.message}`).join('; '), errors, 'ValidationError');
  }
}

export const notFoundApi: RequestHandler = (req, _res, next) => next(new NotFoundError(`route ${req.method} ${req.path}`));

/** One error shape for every route: { name, message, errors? }. No stack traces in answers. */
export function errorHandler(logStacks: boolean): ErrorRequestHandler {
  return (err: unknown, _req, res, _next) => {
    if (err instanceof HttpError) {
      res.status(err.status).json({ name: err.name, message: err.message, ...(err.errors ? { errors: err.errors } : {}) });
      return;
    }
    // body-parser errors carry a status (413 too large, 400 malformed JSON).
    const status = typeof err === 'object' && err !== null && 'status' in err ? Number((err as { status: unknown }).status) : 500;
    if (status >= 400 && status < 500) {
      const message = status === 413 ? 'Request body is too large.' : 'Request body is not valid JSON.';
      res.status(status).json({ name: status === 413 ? 'PayloadTooLarge' : 'BadRequest', message, errors: [{ field: 'body', message }] });
      return;
    }
    if (logStacks) console.error(err);
    res.status(500).json({ name: 'InternalError', message: 'Something went wrong on the server; the error has been logged.' });
  };
}
