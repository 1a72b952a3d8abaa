/** `/api/workshops/*`: the user's workshops, settings and members. */
import { memberParams, memberUpdateBody, workshopCreateBody, workshopIdParams, workshopUpdateBody } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { currentUser } from '../../auth/user.ts';
import type { FeatureDeps } from '../context.ts';
import { createWorkshopService } from './workshops.service.ts';

export function workshopRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createWorkshopService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/workshops',
      access: { kind: 'signedIn' },
      handler: async (req, res) => {
        res.json({ workshops: await service.listForUser(currentUser(req).id) });
      },
    },
    {
      method: 'post',
      path: '/workshops',
      access: { kind: 'signedIn' },
      handler: async (req, res) => {
        const { name } = workshopCreateBody.parse(req.body);
        res.status(201).json(await service.create(name, currentUser(req).id));
      },
    },
    {
      method: 'get',
      path: '/workshops/:workshopId',
      access: { kind: 'member', action: 'workshop.read', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        res.json(await service.get(workshopId, currentUser(req).id));
      },
    },
    {
      method: 'patch',
      path: '/workshops/:workshopId',
      access: { kind: 'member', action: 'workshop.update', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        const { name } = workshopUpdateBody.parse(req.body);
        res.json(await service.rename(workshopId, name, currentUser(req).id));
      },
    },
    {
      method: 'delete',
      path: '/workshops/:workshopId',
      access: { kind: 'member', action: 'workshop.delete', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        await service.remove(workshopId);
        res.status(204).end();
      },
    },
    {
      method: 'get',
      path: '/workshops/:workshopId/members',
      access: { kind: 'member', action: 'members.read', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        res.json({ members: await service.members(workshopId) });
      },
    },
    {
      method: 'patch',
      path: '/workshops/:workshopId/members/:userId',
      access: { kind: 'member', action: 'members.manage', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId, userId } = memberParams.parse(req.params);
        const { role } = memberUpdateBody.parse(req.body);
        res.json(await service.setRole(workshopId, userId, role));
      },
    },
    {
      method: 'delete',
      path: '/workshops/:workshopId/members/:userId',
      access: { kind: 'member', action: 'members.manage', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId, userId } = memberParams.parse(req.params);
        await service.removeMember(workshopId, userId);
        res.status(204).end();
      },
    },
  ];
}
