import type { Router } from 'express';
import { mountRoutes } from '../auth/access.ts';
import type { FeatureDeps } from './context.ts';
import { apiRouteTable } from './routeTable.ts';

/**
 * A feature mounts its routes on the `/api` router; `app.ts` mounts them in this order, after
 * the session, sign-in and CSRF layers. Declare routes as `RouteDef`s (with their access rule)
 * and mount them with `mountRoutes`: the authorisation matrix test fails for any route that is
 * not in a route table.
 */
export type MountFeature = (api: Router, deps: FeatureDeps) => void;

export const apiFeatures: MountFeature[] = [
  (api, deps) => mountRoutes(api, deps.sequelize, apiRouteTable(deps)),
];
