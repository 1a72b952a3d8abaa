/**
 * Cross-site request forgery defence: csrf-csrf's signed double-submit cookie, bound to the
 * session id. Every POST, PUT, PATCH and DELETE must carry the token in `x-csrf-token`; a page
 * on another site can neither read the cookie nor set the header. SameSite=Lax cookies are a
 * second layer. See DEVELOPERS.md.
 */
import type { Request, RequestHandler } from 'express';
import { createHmac } from 'node:crypto';
import { doubleCsrf } from 'csrf-csrf';
import type { Config } from '../config.ts';
import { HttpError } from '../http/HttpError.ts';

export const CSRF_HEADER = 'x-csrf-token';

export function createCsrf(config: Config) {
  // Derived from the session secret so the two never share a key.
  const secret = createHmac('sha256', config.sessionSecret).update('casewright csrf').digest('hex');
  const { doubleCsrfProtection, generateCsrfToken } = doubleCsrf({
    getSecret: () => secret,
    getSessionIdentifier: (req) => req.session?.id ?? '',
    cookieName: config.isProduction ? '__Host-casewright.csrf' : 'casewright.csrf',
    cookieOptions: { sameSite: 'lax', secure: config.isProduction, httpOnly: true, path: '/' },
    getCsrfTokenFromRequest: (req) => req.get(CSRF_HEADER),
  });

  const protect: RequestHandler = (req, res, next) =>
    doubleCsrfProtection(req, res, (error?: unknown) => {
      if (error) return next(new HttpError(403, 'csrf_invalid', `Missing or stale ${CSRF_HEADER} header; fetch a token from GET /api/auth/csrf.`));
      next();
    });

  /**
   * A token for this session. The session is marked so it is stored (an anonymous visitor's
   * session id must stay the same between fetching the token and using it).
   */
  function issue(req: Request, res: Parameters<typeof generateCsrfToken>[1], overwrite = false): string {
    (req.session as { csrfIssued?: boolean }).csrfIssued = true;
    return generateCsrfToken(req, res, { overwrite });
  }

  return { protect, issue };
}

export type Csrf = ReturnType<typeof createCsrf>;
