/**
 * The shape the feature routes share: read the path parameters, the query and the body through
 * their zod schemas (in that order, so the first bad part is the one reported), hand them to
 * the service call, and answer with what it returns as JSON. Authorisation is not here: the
 * guard in front of every route (`server/auth/access.ts`) has already let the caller through.
 */
import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { currentUser } from '../auth/user.ts';

/** What a route reads, each part through its schema; a part without one is `undefined`. */
export interface RouteInput<P, Q, B> {
  params: P;
  query: Q;
  body: B;
  /** The signed-in user's id, read when asked (the guard has made sure there is one). */
  readonly userId: string;
  /** The signed-in user, read when asked, for services that need more than the id (name, e-mail). */
  readonly user: Express.User;
}

interface HandleOptions<P, Q, B> {
  params?: z.ZodType<P>;
  query?: z.ZodType<Q>;
  body?: z.ZodType<B>;
  /** 200 by default; 201 for a creation; 204 answers with no body whatever `run` returns. */
  status?: 200 | 201 | 204;
}

/** A route handler that parses the request with `options`' schemas, runs `run` and sends its result. */
export function handle<P = undefined, Q = undefined, B = undefined>(options: HandleOptions<P, Q, B>, run: (input: RouteInput<P, Q, B>) => Promise<unknown>): RequestHandler {
  const status = options.status ?? 200;
  return async (req, res) => {
    const input = readInput(req, options);
    const result = await run(input);
    if (status === 204) res.status(204).end();
    else res.status(status).json(result);
  };
}

function readInput<P, Q, B>(req: Request, options: HandleOptions<P, Q, B>): RouteInput<P, Q, B> {
  const params = options.params ? options.params.parse(req.params) : (undefined as P);
  const query = options.query ? options.query.parse(req.query) : (undefined as Q);
  const body = options.body ? options.body.parse(req.body) : (undefined as B);
  return {
    params, query, body,
    get userId() {
      return currentUser(req).id;
    },
    get user() {
      return currentUser(req);
    },
  };
}
