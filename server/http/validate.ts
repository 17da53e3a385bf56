import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { ValidationError } from './errors';

/** Dotted path of a zod issue, e.g. `definition.rows[3].seebeck`. */
export function issuePath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((acc, k) => (typeof k === 'number' ? `${acc}[${k}]` : acc ? `${acc}.${String(k)}` : String(k)), '');
}

/** Field errors listed per answer: a 2 MB body of bad table rows would otherwise answer with tens of thousands. */
export const fieldErrorsListed = 50;

export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, prefix = ''): z.output<S> {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const issues = r.error.issues;
  const errors = issues.slice(0, fieldErrorsListed).map((i) => ({ field: [prefix, issuePath(i.path)].filter(Boolean).join('.') || 'body', message: i.message }));
  if (issues.length > fieldErrorsListed) errors.push({ field: prefix || 'body', message: `${issues.length - fieldErrorsListed} more problems not listed; fix the ones above first` });
  throw new ValidationError(errors);
}

/** Validates the JSON body at the edge; the handler receives the parsed value in `res.locals.body`. */
export function body<S extends z.ZodType>(schema: S): RequestHandler {
  return (req, res, next) => {
    res.locals.body = parseOrThrow(schema, req.body ?? {});
    next();
  };
}

const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A malformed id cannot name anything of the caller's: it answers like an unknown one. */
export function isUuid(value: unknown): value is string {
  return typeof value === 'string' && uuid.test(value);
}
