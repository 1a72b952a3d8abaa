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

/** Fetch JSON from the API; throws {@link ApiError} on any non-OK answer so TanStack Query sees it. */
export async function fetchJson<T>(path: string, init: RequestInit = {}): Promise<T> {
  const headers = new Headers(init.headers);
  if (init.body !== undefined && !headers.has('Content-Type')) headers.set('Content-Type', 'application/json');
  headers.set('Accept', 'application/json');
  const response = await fetch(path, { credentials: 'same-origin', ...init, headers });
  const text = await response.text();
  const body = text ? safeJson(text) : undefined;
  if (!response.ok) {
    const error = (body as { error?: { code?: string; message?: string; details?: unknown } } | undefined)?.error;
    throw new ApiError(response.status, error?.code ?? 'http_error', error?.message ?? `${response.status} ${response.statusText}`, error?.details);
  }
  return body as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}
