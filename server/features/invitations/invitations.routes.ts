/** Invitations: owners send and revoke them; the invitee previews and accepts by token. */
import { z } from 'zod';
import { tokenSchema } from '../../../shared/schemas/auth.ts';
import { invitationCreateBody, invitationParams, workshopIdParams } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { currentUser } from '../../auth/user.ts';
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
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        res.json({ invitations: await service.list(workshopId) });
      },
    },
    {
      method: 'post',
      path: '/workshops/:workshopId/invitations',
      access: { kind: 'member', action: 'invitations.manage', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        const { email, role } = invitationCreateBody.parse(req.body);
        res.status(201).json(await service.create(workshopId, email, role, currentUser(req)));
      },
    },
    {
      method: 'delete',
      path: '/workshops/:workshopId/invitations/:invitationId',
      access: { kind: 'member', action: 'invitations.manage', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId, invitationId } = invitationParams.parse(req.params);
        await service.revoke(workshopId, invitationId);
        res.status(204).end();
      },
    },
    {
      method: 'get',
      path: '/invitations/:token',
      access: { kind: 'public' },
      handler: async (req, res) => {
        const { token } = tokenParams.parse(req.params);
        res.json(await service.preview(token));
      },
    },
    {
      method: 'post',
      path: '/invitations/:token/accept',
      access: { kind: 'signedIn' },
      handler: async (req, res) => {
        const { token } = tokenParams.parse(req.params);
        res.json(await service.accept(token, currentUser(req)));
      },
    },
  ];
}
