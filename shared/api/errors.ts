import { z } from 'zod';

/** One field-level problem inside an API error. */
export const fieldErrorSchema = z.object({
  field: z.string(),
  message: z.string(),
});

/**
 * Every non-2xx JSON body from the API has this shape. `name` is the error
 * class (e.g. "NotFound", "ValidationError"), `message` is meant for people.
 */
export const apiErrorBodySchema = z.object({
  name: z.string(),
  message: z.string(),
  errors: z.array(fieldErrorSchema).optional(),
});

export type FieldError = z.infer<typeof fieldErrorSchema>;
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;
