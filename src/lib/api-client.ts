import type { z } from 'zod';

/**
 * The one way the client talks to the server. It sends JSON to `/api`, carries the CSRF
 * token on state-changing requests, and turns every failure into an `ApiError`.
 * It never shows a message and never navigates: the UI decides what a failure means.
 */

export type ApiErrorFields = Record<string, string>;

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: ApiErrorFields;

  constructor(status: number, code: string, message: string, fields: ApiErrorFields = {}) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiError(error: unknown, code?: string): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

const API_BASE = '/api';
type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

let csrfToken: Promise<string> | null = null;

/** Forget the CSRF token; call after sign-in, sign-up or sign-out, which start a new session. */
export function resetCsrfToken(): void {
  csrfToken = null;
}

function getCsrfToken(): Promise<string> {
  if (!csrfToken) {
    const pending = send('GET', '/auth/csrf').then((body) => {
      const token = (body as { csrfToken?: unknown } | undefined)?.csrfToken;
      if (typeof token !== 'string' || token === '') {
        throw new ApiError(0, 'unexpected_response', 'The server did not hand out a form token.');
      }
      return token;
    });
    // A failed fetch must not be cached: the next request tries again.
    pending.catch(() => {
      if (csrfToken === pending) csrfToken = null;
    });
    csrfToken = pending;
  }
  return csrfToken;
}

function errorFromBody(status: number, body: unknown): ApiError {
  const error = (body as { error?: unknown } | undefined)?.error;
  if (error && typeof error === 'object') {
    const { code, message, fields } = error as Record<string, unknown>;
    const cleanFields: ApiErrorFields = {};
    if (fields && typeof fields === 'object') {
      for (const [key, value] of Object.entries(fields)) {
        if (typeof value === 'string') cleanFields[key] = value;
      }
    }
    return new ApiError(
      status,
      typeof code === 'string' ? code : 'unknown_error',
      typeof message === 'string' ? message : `The server answered ${status}.`,
      cleanFields,
    );
  }
  return new ApiError(status, 'unexpected_response', `The server answered ${status}.`);
}

async function send(
  method: Method,
  path: string,
  body?: unknown,
  headers: Record<string, string> = {},
): Promise<unknown> {
  let response: Response;
  // A FormData body (a file upload) goes as multipart: the browser sets its type and boundary.
  const form = body instanceof FormData;
  try {
    response = await fetch(API_BASE + path, {
      method,
      credentials: 'same-origin',
      headers: {
        Accept: 'application/json',
        ...(body === undefined || form ? {} : { 'Content-Type': 'application/json' }),
        ...headers,
      },
      body: body === undefined ? undefined : form ? body : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'network_error', 'Could not reach Blockwright. Check your connection and try again.');
  }

  if (response.status === 204) return undefined;

  let parsed: unknown;
  const text = await response.text();
  try {
    parsed = text === '' ? undefined : JSON.parse(text);
  } catch {
    throw response.ok
      ? new ApiError(response.status, 'unexpected_response', 'The server sent something that is not JSON.')
      : new ApiError(response.status, 'unexpected_response', `The server answered ${response.status}.`);
  }

  if (!response.ok) throw errorFromBody(response.status, parsed);
  return parsed;
}

async function request(method: Method, path: string, body?: unknown): Promise<unknown> {
  if (method === 'GET') return send(method, path);

  const attempt = async () => send(method, path, body, { 'x-csrf-token': await getCsrfToken() });
  try {
    return await attempt();
  } catch (error) {
    // The token belongs to a session that has since changed: fetch a fresh one, retry once.
    if (isApiError(error, 'csrf_invalid') && error.status === 403) {
      resetCsrfToken();
      return attempt();
    }
    throw error;
  }
}

function parseWith<S extends z.ZodType>(schema: S, value: unknown): z.infer<S> {
  const result = schema.safeParse(value);
  if (!result.success) {
    throw new ApiError(0, 'unexpected_response', 'The server sent data this page does not understand.');
  }
  return result.data;
}

export const apiClient = {
  get: async <S extends z.ZodType>(path: string, schema: S) =>
    parseWith(schema, await request('GET', path)),
  post: async <S extends z.ZodType>(path: string, body: unknown, schema: S) =>
    parseWith(schema, await request('POST', path, body)),
  patch: async <S extends z.ZodType>(path: string, body: unknown, schema: S) =>
    parseWith(schema, await request('PATCH', path, body)),
  put: async <S extends z.ZodType>(path: string, body: unknown, schema: S) =>
    parseWith(schema, await request('PUT', path, body)),
  /** A multipart form (file uploads), with the CSRF token like every other POST. */
  postForm: async <S extends z.ZodType>(path: string, form: FormData, schema: S) =>
    parseWith(schema, await request('POST', path, form)),
  /** DELETE; the answer (usually 204 No Content) is ignored. */
  delete: async (path: string) => {
    await request('DELETE', path);
  },
  /** For endpoints that answer 204 No Content (or a body the caller ignores). */
  postNoContent: async (path: string, body?: unknown) => {
    await request('POST', path, body ?? {});
  },
};
