/**
 * Every API route is declared with who may call it, and mounted through here: the guard reads
 * the rule table in shared/permissions.ts, and the integration suite reads the same list to
 * build its authorisation matrix (a route declared without a rule cannot be mounted at all).
 *
 * Outsiders get 404 for a workshop's resources, the same answer as an unknown id, so ids do not
 * reveal what exists; members whose role lacks the action get 403.
 */
import type { Request, RequestHandler, Router } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { z } from 'zod';
import { can, type Action, type Role } from '../../shared/permissions.ts';
import { idSchema } from '../../shared/schemas/common.ts';
import { forbidden, notFound } from '../http/HttpError.ts';
import { currentUser } from './user.ts';

/** Where the guard finds the workshop a request acts in. */
export type Scope = 'workshop' | 'design';

export type Access =
  | { kind: 'public' }
  | { kind: 'signedIn' }
  | { kind: 'member'; action: Action; scope: Scope };

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** One API route: its method, its path under `/api`, who may call it, and the handler. */
export interface RouteDef {
  method: Method;
  path: string;
  access: Access;
  /** Extra middleware run before the guard (e.g. a rate limit). */
  before?: RequestHandler[];
  handler: RequestHandler;
}

/** The membership the guard found, for the handler. */
export interface MemberAccess {
  workshopId: string;
  role: Role;
}

const workshopParams = z.object({ workshopId: idSchema });
const designParams = z.object({ designId: idSchema });

async function roleIn(sequelize: Sequelize, scope: Scope, req: Request, userId: string): Promise<MemberAccess | null> {
  const sql =
    scope === 'workshop'
      ? 'SELECT w.id AS "workshopId", m.role FROM workshops w LEFT JOIN memberships m ON m.workshop_id = w.id AND m.user_id = :userId WHERE w.id = :id'
      : 'SELECT d.workshop_id AS "workshopId", m.role FROM designs d LEFT JOIN memberships m ON m.workshop_id = d.workshop_id AND m.user_id = :userId WHERE d.id = :id';
  const id = scope === 'workshop' ? workshopParams.parse(req.params).workshopId : designParams.parse(req.params).designId;
  const rows = await sequelize.query<{ workshopId: string; role: Role | null }>(sql, { type: QueryTypes.SELECT, replacements: { id, userId } });
  const row = rows[0];
  return row?.role ? { workshopId: row.workshopId, role: row.role } : null;
}

/** The middleware that enforces `access`; for members it leaves the membership in `res.locals.member`. */
export function guard(sequelize: Sequelize, access: Access): RequestHandler {
  return async (req, res, next) => {
    if (access.kind === 'public') return next();
    const user = currentUser(req);
    if (access.kind === 'signedIn') return next();
    const member = await roleIn(sequelize, access.scope, req, user.id);
    if (!member) throw notFound(access.scope === 'workshop' ? 'Workshop' : 'Design');
    if (!can(member.role, access.action)) throw forbidden(`A ${member.role} may not do this (${access.action}).`);
    res.locals.member = member;
    next();
  };
}

/** The membership the guard checked; only valid behind a `member` rule. */
export function memberOf(res: { locals: Record<string, unknown> }): MemberAccess {
  return res.locals.member as MemberAccess;
}

/** Mount `routes` on `router`, each behind its guard. */
export function mountRoutes(router: Router, sequelize: Sequelize, routes: readonly RouteDef[]): void {
  for (const route of routes) {
    router[route.method](route.path, ...(route.before ?? []), guard(sequelize, route.access), route.handler);
  }
}
