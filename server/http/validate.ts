import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { issuePath, wordIssue } from '../../shared/api/field-labels';
import { ValidationError } from './errors';

/** Field errors listed per answer: a 2 MB body of bad table rows would otherwise answer with tens of thousands. */
export const fieldErrorsListed = 50;

/** Parses at the edge; each refused field is named by its label, as the form shows it (shared/api/field-labels.ts). */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, prefix = ''): z.output<S> {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const issues = r.error.issues;
  const errors = issues.slice(0, fieldErrorsListed).map((i) => ({ field: [prefix, issuePath(i.path)].filter(Boolean).join('.') || 'body', message: wordIssue(i, prefix) }));
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
