/**
 * The CSRF token the API wants in `x-csrf-token` on every POST, PATCH and DELETE. It is bound
 * to the session, so it is fetched once, kept in memory, and forgotten when the session changes
 * (sign-in, sign-out) or the server calls it stale.
 */
import { csrfResponse } from '../../shared/schemas/auth.ts';

export const CSRF_HEADER = 'x-csrf-token';

let token: Promise<string> | null = null;

/** The current token, fetching one from `GET /api/auth/csrf` when none is held. */
export function csrfToken(): Promise<string> {
  token ??= fetch('/api/auth/csrf', { credentials: 'same-origin', headers: { Accept: 'application/json' } })
    .then(async (response) => {
      if (!response.ok) throw new Error(`The server gave no form token (${response.status}); reload the page.`);
      return csrfResponse.parse(await response.json()).csrfToken;
    })
    .catch((error: unknown) => {
      token = null;
      throw error;
    });
  return token;
}

/** Keeps a token the server handed over with another answer (e.g. `me`). */
export function rememberCsrfToken(value: string): void {
  token = Promise.resolve(value);
}

/** Forgets the token: the next write fetches a fresh one. */
export function forgetCsrfToken(): void {
  token = null;
}
