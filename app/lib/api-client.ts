// The one way the client talks to Lobewright's JSON API: sends the CSRF token on every change,
// and parses every answer with the zod schema from shared/api so that the rest of the client
// only ever sees data of the promised shape.
import type { z } from 'zod';
import { apiErrorSchema } from '../../shared/api/schemas';

/** Any failed request: the server's error code and message, field errors keyed by dotted path. */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    /** Machine-readable extras, e.g. every line-numbered problem of an uploaded file. */
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

/**
 * Where the CSRF token comes from. The session query cache owns it (it changes at sign-in,
 * sign-out and sign-up), so the provider wires this up; lib/ knows nothing of features.
 */
export interface CsrfTokenSource {
  current(): Promise<string>;
  /** Fetches a fresh session after the server refused the token (e.g. the session expired). */
  refresh(): Promise<string>;
}

let csrfSource: CsrfTokenSource | null = null;

export function setCsrfTokenSource(source: CsrfTokenSource): void {
  csrfSource = source;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

interface RequestInit_ {
  method: Method;
  body?: unknown;
  query?: Record<string, string | undefined>;
  signal?: AbortSignal;
}

const API_ROOT = '/api';

function buildUrl(path: string, query?: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {}))
    if (value !== undefined) params.set(key, value);
  const search = params.toString();
  return `${API_ROOT}${path}${search ? `?${search}` : ''}`;
}

async function send(path: string, init: RequestInit_, csrfToken: string | null): Promise<Response> {
  const headers: Record<string, string> = { accept: 'application/json' };
  // A form (file upload) sets its own multipart content type with the boundary.
  const form = init.body instanceof FormData ? init.body : null;
  if (init.body !== undefined && !form) headers['content-type'] = 'application/json';
  if (csrfToken !== null) headers['x-csrf-token'] = csrfToken;
  try {
    return await fetch(buildUrl(path, init.query), {
      method: init.method,
      headers,
      body: form ?? (init.body === undefined ? undefined : JSON.stringify(init.body)),
      credentials: 'same-origin',
      signal: init.signal,
    });
  } catch (err) {
    if (err instanceof DOMException && err.name === 'AbortError') throw err;
    throw new ApiError(
      0,
      'network',
      'Could not reach the Lobewright server. Check the connection and try again.',
    );
  }
}

async function errorFrom(response: Response): Promise<ApiError> {
  const body: unknown = await response.json().catch(() => null);
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) {
    const { code, message, fields, details } = parsed.data.error;
    return new ApiError(response.status, code, message, fields ?? {}, details ?? {});
  }
  const reason = response.statusText ? ` (${response.statusText})` : '';
  return new ApiError(
    response.status,
    `http_${response.status}`,
    `The server answered ${response.status}${reason}.`,
  );
}

async function request(path: string, init: RequestInit_): Promise<Response> {
  const changes = init.method !== 'GET';
  if (changes && !csrfSource)
    throw new Error('setCsrfTokenSource must be called before the first change request');
  let response = await send(path, init, changes ? await csrfSource!.current() : null);
  // A refused token usually means the session rotated in another tab: fetch it again, try once more.
  if (changes && response.status === 403) {
    const error = await errorFrom(response.clone());
    if (!/csrf/i.test(error.code)) throw error;
    response = await send(path, init, await csrfSource!.refresh());
  }
  if (!response.ok) throw await errorFrom(response);
  return response;
}

async function parseBody<S extends z.ZodType>(
  response: Response,
  schema: S,
  what: string,
): Promise<z.output<S>> {
  const body: unknown = await response.json().catch(() => undefined);
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue && issue.path.length ? ` at ${issue.path.join('.')}` : '';
    throw new ApiError(
      response.status,
      'unexpected_response',
      `The server's answer to ${what} was not in the expected form${where}: ${issue?.message ?? 'unreadable'}.`,
    );
  }
  return parsed.data;
}

async function withSchema<S extends z.ZodType>(
  path: string,
  init: RequestInit_,
  schema: S,
): Promise<z.output<S>> {
  const response = await request(path, init);
  return parseBody(response, schema, `${init.method} ${path}`);
}

export const api = {
  get<S extends z.ZodType>(
    path: string,
    schema: S,
    options: { query?: Record<string, string | undefined>; signal?: AbortSignal } = {},
  ): Promise<z.output<S>> {
    return withSchema(path, { method: 'GET', ...options }, schema);
  },
  post<S extends z.ZodType>(path: string, body: unknown, schema: S): Promise<z.output<S>> {
    return withSchema(path, { method: 'POST', body }, schema);
  },
  put<S extends z.ZodType>(path: string, body: unknown, schema: S): Promise<z.output<S>> {
    return withSchema(path, { method: 'PUT', body }, schema);
  },
  patch<S extends z.ZodType>(path: string, body: unknown, schema: S): Promise<z.output<S>> {
    return withSchema(path, { method: 'PATCH', body }, schema);
  },
  /** POST multipart/form-data (a file and its form fields). */
  upload<S extends z.ZodType>(path: string, form: FormData, schema: S): Promise<z.output<S>> {
    return withSchema(path, { method: 'POST', body: form }, schema);
  },
  /** DELETE answers 204 No Content. */
  async delete(path: string): Promise<void> {
    await request(path, { method: 'DELETE' });
  },
};
