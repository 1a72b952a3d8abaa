/**
 * Sign-in and reset attempts are limited per client address and e-mail, so guessing a password
 * is slow while other people on the same network can still sign in. Successful sign-ins do not
 * count. Counters live in memory; behind several API processes use a shared store.
 */
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import type { Request } from 'express';

/** Failed sign-ins allowed per address and e-mail per window. */
export const LOGIN_ATTEMPTS = 10;
const WINDOW_MS = 15 * 60 * 1000;

function addressAndEmail(req: Request): string {
  const email = typeof req.body?.email === 'string' ? req.body.email.toLowerCase().slice(0, 254) : '';
  return `${ipKeyGenerator(req.ip ?? '')}|${email}`;
}

function limited(message: string) {
  return { error: { code: 'too_many_attempts', message } };
}

export function loginLimiter() {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: LOGIN_ATTEMPTS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: addressAndEmail,
    message: limited('Too many failed sign-ins; wait 15 minutes and try again.'),
  });
}

/** Reset e-mails per address and e-mail per window, so the form cannot be used to flood an inbox. */
export function resetLimiter() {
  return rateLimit({
    windowMs: WINDOW_MS,
    limit: 5,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: addressAndEmail,
    message: limited('Too many reset requests; wait 15 minutes and try again.'),
  });
}
