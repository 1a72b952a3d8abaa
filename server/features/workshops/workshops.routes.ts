/** `/api/workshops/*`: the user's workshops, settings and members. */
import { memberParams, memberUpdateBody, workshopCreateBody, workshopIdParams, workshopUpdateBody } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { handle } from '../../http/handle.ts';
import type { FeatureDeps } from '../context.ts';
import { createWorkshopService } from './workshops.service.ts';

export function workshopRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createWorkshopService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/workshops',
      access: { kind: 'signedIn' },
      handler: handle({}, async ({ userId }) => ({ workshops: await service.listForUser(userId) })),
    },
    {
      method: 'post',
      path: '/workshops',
      access: { kind: 'signedIn' },
      handler: handle({ body: workshopCreateBody, status: 201 }, ({ body, userId }) => service.create(body.name, userId)),
    },
    {
      method: 'get',
      path: '/workshops/:workshopId',
      access: { kind: 'member', action: 'workshop.read', scope: 'workshop' },
      handler: handle({ params: workshopIdParams }, ({ params, userId }) => service.get(params.workshopId, userId)),
    },
    {
      method: 'patch',
      path: '/workshops/:workshopId',
      access: { kind: 'member', action: 'workshop.update', scope: 'workshop' },
      handler: handle({ params: workshopIdParams, body: workshopUpdateBody }, ({ params, body, userId }) => service.rename(params.workshopId, body.name, userId)),
    },
    {
      method: 'delete',
      path: '/workshops/:workshopId',
      access: { kind: 'member', action: 'workshop.delete', scope: 'workshop' },
      handler: handle({ params: workshopIdParams, status: 204 }, ({ params }) => service.remove(params.workshopId)),
    },
    {
      method: 'get',
      path: '/workshops/:workshopId/members',
      access: { kind: 'member', action: 'members.read', scope: 'workshop' },
      handler: handle({ params: workshopIdParams }, async ({ params }) => ({ members: await service.members(params.workshopId) })),
    },
    {
      method: 'patch',
      path: '/workshops/:workshopId/members/:userId',
      access: { kind: 'member', action: 'members.manage', scope: 'workshop' },
      handler: handle({ params: memberParams, body: memberUpdateBody }, ({ params, body }) => service.setRole(params.workshopId, params.userId, body.role)),
    },
    {
      method: 'delete',
      path: '/workshops/:workshopId/members/:userId',
      access: { kind: 'member', action: 'members.manage', scope: 'workshop' },
      handler: handle({ params: memberParams, status: 204 }, ({ params }) => service.removeMember(params.workshopId, params.userId)),
    },
  ];
}
