/** The one HTTP error class. Services throw it; the error middleware renders it as JSON. */
export class HttpError extends Error {
  override readonly name = 'HttpError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, details?: unknown) => new HttpError(400, 'bad_request', message, details);
export const unauthorized = (message = 'Sign in first.') => new HttpError(401, 'unauthorized', message);
export const forbidden = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const notFound = (what = 'Resource') => new HttpError(404, 'not_found', `${what} not found.`);
export const conflict = (message: string, details?: unknown) => new HttpError(409, 'conflict', message, details);
