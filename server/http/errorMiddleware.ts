import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { isInputError } from '../../shared/errors.ts';
import { HttpError } from './HttpError.ts';

type ErrorBody = { error: { code: string; message: string; details?: unknown } };

const DATABASE_DOWN = new Set([
  'SequelizeConnectionError', 'SequelizeConnectionRefusedError', 'SequelizeConnectionTimedOutError',
  'SequelizeHostNotReachableError', 'SequelizeConnectionAcquireTimeoutError', 'SequelizeAccessDeniedError',
]);

function isDatabaseDown(error: unknown): boolean {
  if (!(error instanceof Error)) return false;
  if (DATABASE_DOWN.has(error.name)) return true;
  const code = (error as { code?: string; parent?: { code?: string } }).parent?.code ?? (error as { code?: string }).code;
  // PostgreSQL shutting down / cannot connect / connection lost.
  return ['ECONNREFUSED', 'ECONNRESET', '57P01', '57P02', '57P03', '08006', '08001', '08003'].includes(code ?? '')
    || /Connection terminated|connection timeout|Connection is closed/i.test(error.message);
}

/** Map any thrown value to a status and the JSON error shape `{ error: { code, message, details? } }`. */
export function toErrorResponse(error: unknown): { status: number; body: ErrorBody } {
  if (error instanceof HttpError) {
    return { status: error.status, body: { error: { code: error.code, message: error.message, ...(error.details === undefined ? {} : { details: error.details }) } } };
  }
  if (error instanceof ZodError) {
    const details = error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    const first = details[0];
    return { status: 400, body: { error: { code: 'invalid_input', message: first ? `${first.path || 'body'}: ${first.message}` : 'Invalid input.', details } } };
  }
  if (isInputError(error)) {
    return { status: 400, body: { error: { code: 'invalid_input', message: `${error.field}: ${error.message}`, details: [{ path: error.field, message: error.message, limit: error.limit }] } } };
  }
  const bodyParser = error as { type?: string; status?: number; limit?: number };
  if (bodyParser?.type === 'entity.too.large') {
    return { status: 413, body: { error: { code: 'payload_too_large', message: `The request body is larger than the ${bodyParser.limit} byte limit.` } } };
  }
  if (bodyParser?.type === 'entity.parse.failed') {
    return { status: 400, body: { error: { code: 'malformed_json', message: 'The request body is not valid JSON.' } } };
  }
  if (bodyParser?.status && bodyParser.status >= 400 && bodyParser.status < 500) {
    return { status: bodyParser.status, body: { error: { code: 'bad_request', message: (error as Error).message } } };
  }
  if (isDatabaseDown(error)) {
    return { status: 503, body: { error: { code: 'database_unavailable', message: 'The database is not reachable right now; try again in a moment.' } } };
  }
  return { status: 500, body: { error: { code: 'internal', message: 'Something went wrong on the server.' } } };
}

export const errorMiddleware: ErrorRequestHandler = (error, req, res, _next) => {
  const { status, body } = toErrorResponse(error);
  if (status >= 500 && status !== 503 && process.env.NODE_ENV !== 'test') {
    console.error(`[api] ${req.method} ${req.originalUrl}:`, error);
  }
  if (res.headersSent) return;
  res.status(status).json(body);
};

/** Unknown `/api` routes answer 404 JSON instead of falling through to the client. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.originalUrl}.` } });
};
