/**
 * Every API route of the accounts and designs features, each with who may call it. The app
 * mounts exactly this list, and the integration suite builds its authorisation matrix from it.
 */
import type { RouteDef } from '../auth/access.ts';
import { authRoutes } from './auth/auth.routes.ts';
import { commentRoutes } from './comments/comments.routes.ts';
import type { FeatureDeps } from './context.ts';
import { designRoutes } from './designs/designs.routes.ts';
import { invitationRoutes } from './invitations/invitations.routes.ts';
import { mailRoutes } from './mail/mail.routes.ts';
import { priceListRoutes } from './priceLists/priceLists.routes.ts';
import { stockRoutes } from './stock/stock.routes.ts';
import { workshopRoutes } from './workshops/workshops.routes.ts';

export function apiRouteTable(deps: FeatureDeps): RouteDef[] {
  return [
    ...authRoutes(deps),
    ...workshopRoutes(deps),
    ...invitationRoutes(deps),
    ...designRoutes(deps),
    ...commentRoutes(deps),
    ...priceListRoutes(deps),
    ...stockRoutes(deps),
    // The mail catcher's inbox exists only outside production, when the app runs one.
    ...(deps.mailbox && !deps.config.isProduction ? mailRoutes(deps.mailbox) : []),
  ];
}
