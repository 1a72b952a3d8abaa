/** Invitations: owners send and revoke them; the invitee previews and accepts by token. */
import { z } from 'zod';
import { tokenSchema } from '../../../shared/schemas/auth.ts';
import { invitationCreateBody, invitationParams, workshopIdParams } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { handle } from '../../http/handle.ts';
import type { FeatureDeps } from '../context.ts';
import { createInvitationService } from './invitations.service.ts';

const tokenParams = z.object({ token: tokenSchema });

export function invitationRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createInvitationService(deps.sequelize, deps.models, deps.mailer, deps.publicUrl);
  return [
    {
      method: 'get',
      path: '/workshops/:workshopId/invitations',
      access: { kind: 'member', action: 'invitations.manage', scope: 'workshop' },
      handler: handle({ params: workshopIdParams }, async ({ params }) => ({ invitations: await service.list(params.workshopId) })),
    },
    {
      method: 'post',
      path: '/workshops/:workshopId/invitations',
      access: { kind: 'member', action: 'invitations.manage', scope: 'workshop' },
      handler: handle({ params: workshopIdParams, body: invitationCreateBody, status: 201 }, ({ params, body, user }) => service.create(params.workshopId, body.email, body.role, user)),
    },
    {
      method: 'delete',
      path: '/workshops/:workshopId/invitations/:invitationId',
      access: { kind: 'member', action: 'invitations.manage', scope: 'workshop' },
      handler: handle({ params: invitationParams, status: 204 }, ({ params }) => service.revoke(params.workshopId, params.invitationId)),
    },
    {
      method: 'get',
      path: '/invitations/:token',
      access: { kind: 'public' },
      handler: handle({ params: tokenParams }, ({ params }) => service.preview(params.token)),
    },
    {
      method: 'post',
      path: '/invitations/:token/accept',
      access: { kind: 'signedIn' },
      handler: handle({ params: tokenParams }, ({ params, user }) => service.accept(params.token, user)),
    },
  ];
}
