/** `/api/auth/*`: CSRF token, register, sign in, sign out, current user, password reset. */
import type { Request, Response } from 'express';
import {
  loginBody, passwordResetConfirmBody, passwordResetRequestBody, registerBody,
} from '../../../shared/schemas/auth.ts';
import type { RouteDef } from '../../auth/access.ts';
import { loginLimiter, resetLimiter } from '../../auth/rateLimit.ts';
import { currentUser } from '../../auth/user.ts';
import { hashCostFor } from '../../auth/password.ts';
import { HttpError } from '../../http/HttpError.ts';
import type { FeatureDeps } from '../context.ts';
import { SESSION_COOKIE } from '../../auth/session.ts';
import { createAuthService } from './auth.service.ts';
import { createWorkshopService } from '../workshops/workshops.service.ts';

/** Sign `user` in: passport regenerates the session (no fixation), so a fresh CSRF token follows. */
function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (error) => (error ? reject(error) : resolve())));
}

export function authRoutes(deps: FeatureDeps): RouteDef[] {
  const { auth, models, sequelize } = deps;
  const service = createAuthService(sequelize, models, deps.mailer, deps.publicUrl, hashCostFor(deps.config.env));
  const workshops = createWorkshopService(sequelize, models);

  async function meBody(req: Request, res: Response, user: Express.User, freshToken: boolean) {
    return {
      user,
      workshops: (await workshops.listForUser(user.id)).map((w) => ({ id: w.id, name: w.name, role: w.role })),
      ...(freshToken ? { csrfToken: auth.csrf.issue(req, res, true) } : {}),
    };
  }

  return [
    {
      method: 'get',
      path: '/auth/csrf',
      access: { kind: 'public' },
      handler: (req, res) => {
        res.json({ csrfToken: auth.csrf.issue(req, res) });
      },
    },
    {
      method: 'post',
      path: '/auth/register',
      access: { kind: 'public' },
      handler: async (req, res) => {
        const body = registerBody.parse(req.body);
        const user = await service.register(body);
        await logIn(req, user);
        res.status(201).json(await meBody(req, res, user, true));
      },
    },
    {
      method: 'post',
      path: '/auth/login',
      access: { kind: 'public' },
      before: [loginLimiter()],
      handler: async (req, res) => {
        const body = loginBody.parse(req.body);
        req.body = body;
        const user = await new Promise<Express.User | false>((resolve, reject) => {
          auth.passport.authenticate('local', { session: false }, (error: unknown, found: Express.User | false) =>
            error ? reject(error) : resolve(found),
          )(req, res, reject);
        });
        if (!user) throw new HttpError(401, 'invalid_credentials', 'That e-mail and password do not match an account.');
        await logIn(req, user);
        res.json(await meBody(req, res, user, true));
      },
    },
    {
      method: 'post',
      path: '/auth/logout',
      access: { kind: 'signedIn' },
      handler: async (req, res) => {
        await new Promise<void>((resolve, reject) => req.logOut((error) => (error ? reject(error) : resolve())));
        await new Promise<void>((resolve, reject) => req.session.destroy((error) => (error ? reject(error) : resolve())));
        res.clearCookie(SESSION_COOKIE, { path: '/' });
        res.status(204).end();
      },
    },
    {
      method: 'get',
      path: '/auth/me',
      access: { kind: 'signedIn' },
      handler: async (req, res) => {
        res.json(await meBody(req, res, currentUser(req), false));
      },
    },
    {
      method: 'post',
      path: '/auth/password-reset',
      access: { kind: 'public' },
      before: [resetLimiter()],
      handler: async (req, res) => {
        const { email } = passwordResetRequestBody.parse(req.body);
        await service.requestPasswordReset(email);
        res.status(202).json({ message: 'If an account uses that e-mail, a reset link is on its way.' });
      },
    },
    {
      method: 'post',
      path: '/auth/password-reset/confirm',
      access: { kind: 'public' },
      handler: async (req, res) => {
        const { token, password } = passwordResetConfirmBody.parse(req.body);
        await service.confirmPasswordReset(token, password);
        res.status(204).end();
      },
    },
  ];
}
