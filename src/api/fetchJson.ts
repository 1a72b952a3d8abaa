import type { ZodType } from 'zod';
import { CSRF_HEADER, csrfToken, forgetCsrfToken } from './csrf.ts';

/** An error answer from the API, carrying its JSON `{ error: { code, message, details } }`. */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

/** True when `error` is an {@link ApiError} with HTTP status `status`. */
export function isApiError(error: unknown, status?: number): error is ApiError {
  return error instanceof ApiError && (status === undefined || error.status === status);
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Fetch JSON from the API; throws {@link ApiError} on any non-OK answer so TanStack Query sees
 * it. Writes carry the CSRF token; a stale token is fetched again once.
 */
export async function fetchJson<T>(path: string, init: RequestInit = {}): Promise<T> {
  const method = (init.method ?? 'GET').toUpperCase();
  const send = async () => {
    const headers = new Headers(init.headers);
    if (init.body !== undefined && !headers.has('Content-Type')) headers.set('Content-Type', 'application/json');
    headers.set('Accept', 'application/json');
    if (!SAFE_METHODS.has(method)) headers.set(CSRF_HEADER, await csrfToken());
    return fetch(path, { credentials: 'same-origin', ...init, method, headers });
  };
  let response = await send();
  if (response.status === 403 && !SAFE_METHODS.has(method)) {
    const first = await readBody(response);
    if (errorOf(first)?.code !== 'csrf_invalid') throw toApiError(response, first);
    forgetCsrfToken();
    response = await send();
  }
  const body = await readBody(response);
  if (!response.ok) throw toApiError(response, body);
  return body as T;
}

/** {@link fetchJson}, then parse the answer with `schema` so the client trusts its types. */
export async function fetchParsed<T>(schema: ZodType<T>, path: string, init: RequestInit = {}): Promise<T> {
  const body = await fetchJson<unknown>(path, init);
  const parsed = schema.safeParse(body);
  if (!parsed.success) {
    throw new ApiError(502, 'bad_response', `The server's answer to ${path} was not in the expected shape: ${parsed.error.issues[0]?.message ?? 'unknown'}`);
  }
  return parsed.data;
}

/** A JSON body for a write. */
export function jsonBody(method: 'POST' | 'PATCH' | 'PUT' | 'DELETE', body?: unknown): RequestInit {
  return body === undefined ? { method } : { method, body: JSON.stringify(body) };
}

type ErrorBody = { error?: { code?: string; message?: string; details?: unknown } } | undefined;

function errorOf(body: unknown) {
  return (body as ErrorBody)?.error;
}

function toApiError(response: Response, body: unknown): ApiError {
  const error = errorOf(body);
  return new ApiError(response.status, error?.code ?? 'http_error', error?.message ?? `${response.status} ${response.statusText}`, error?.details);
}

async function readBody(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
