import type { z } from 'zod';
import { apiErrorBodySchema, type FieldError } from '@/shared/api/errors';

/**
 * Where the API lives. On the web the app is served by the API itself, so
 * the default is the same origin (relative URLs). `EXPO_PUBLIC_API_URL`
 * overrides it, e.g. `http://127.0.0.1:8340` when the Expo dev server runs
 * on :8081. Expo inlines the variable at build time.
 */
export function apiBaseUrl(): string {
  const fromEnv = process.env.EXPO_PUBLIC_API_URL ?? '';
  return fromEnv.replace(/\/+$/, '');
}

/** An error the UI can show: `message` is always written for people. */
export class ApiError extends Error {
  readonly status: number;
  readonly fieldErrors: FieldError[];

  constructor(init: { status: number; name: string; message: string; fieldErrors?: FieldError[] }) {
    super(init.message);
    this.name = init.name;
    this.status = init.status;
    this.fieldErrors = init.fieldErrors ?? [];
  }

  get isNotFound(): boolean {
    return this.status === 404;
  }

  /** 4xx answers will not change by asking again. */
  get isClientError(): boolean {
    return this.status >= 400 && this.status < 500;
  }
}

export type GetOptions = {
  signal?: AbortSignal;
  /** Non-2xx statuses whose body is still a regular response (e.g. 503 health). */
  acceptStatus?: readonly number[];
};

function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function errorFromBody(status: number, body: unknown): ApiError {
  const parsed = apiErrorBodySchema.safeParse(body);
  if (parsed.success) {
    const { name, message, errors } = parsed.data;
    return new ApiError({ status, name, message, fieldErrors: errors });
  }
  return new ApiError({
    status,
    name: 'HttpError',
    message: `The server answered with status ${status}.`,
  });
}

async function send(path: string, init: RequestInit): Promise<Response> {
  try {
    return await fetch(`${apiBaseUrl()}${path}`, { credentials: 'include', ...init });
  } catch (cause) {
    if (init.signal?.aborted) throw cause;
    throw new ApiError({
      status: 0,
      name: 'NetworkError',
      message: 'Could not reach the Frostgrade server. Check your connection and try again.',
    });
  }
}

/** Reads a response: an ApiError unless accepted, else the body checked against its schema. */
async function readAnswer<S extends z.ZodType>(
  path: string,
  response: Response,
  schema: S,
  acceptStatus: readonly number[] = [],
): Promise<z.output<S>> {
  const body = parseJson(await response.text());
  const accepted = response.ok || acceptStatus.includes(response.status);
  if (!accepted) throw errorFromBody(response.status, body);
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    throw new ApiError({
      status: response.status,
      name: 'UnexpectedResponse',
      message: `The server sent an answer this version of Frostgrade does not understand (${path}).`,
    });
  }
  return parsed.data;
}

/** GET a JSON endpoint and validate the answer against its shared schema. */
export async function apiGet<S extends z.ZodType>(
  path: string,
  schema: S,
  options: GetOptions = {},
): Promise<z.output<S>> {
  const response = await send(path, {
    headers: { Accept: 'application/json' },
    signal: options.signal,
  });
  return readAnswer(path, response, schema, options.acceptStatus);
}

export type SendBody = { json: unknown } | { form: FormData } | { none: true };

function encode(body: SendBody): { headers: Record<string, string>; body?: BodyInit } {
  if ('json' in body) {
    return {
      headers: { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: JSON.stringify(body.json),
    };
  }
  // The browser sets the multipart boundary itself: no Content-Type here.
  if ('form' in body) return { headers: { Accept: 'application/json' }, body: body.form };
  return { headers: { Accept: 'application/json' } };
}

/**
 * POST/PUT JSON or a multipart form (or a DELETE that answers with a body),
 * and validate the answer. Error bodies become an ApiError whose
 * `fieldErrors` name the offending fields.
 */
export async function apiSend<S extends z.ZodType>(
  method: 'POST' | 'PUT' | 'DELETE',
  path: string,
  body: SendBody,
  schema: S,
): Promise<z.output<S>> {
  const response = await send(path, { method, ...encode(body) });
  return readAnswer(path, response, schema);
}

/**
 * POST/PUT/DELETE whose success carries nothing to read (204, or a 202 the
 * caller ignores): resolves on 2xx, throws an ApiError otherwise.
 */
export async function apiCommand(
  method: 'POST' | 'PUT' | 'DELETE',
  path: string,
  body: SendBody,
): Promise<void> {
  const response = await send(path, { method, ...encode(body) });
  if (!response.ok) throw errorFromBody(response.status, parseJson(await response.text()));
}
