/** What the session knows about the signed-in user, and the guard that requires one. */
import type { Request, RequestHandler } from 'express';
import { unauthorized } from '../http/HttpError.ts';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface User {
      id: string;
      email: string;
      name: string;
    }
  }
}

/** The signed-in user; throws 401 when there is none. */
export function currentUser(req: Request): Express.User {
  if (!req.user) throw unauthorized();
  return req.user;
}

export const requireUser: RequestHandler = (req, _res, next) => {
  currentUser(req);
  next();
};
