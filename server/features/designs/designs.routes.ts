/** Designs in a workshop, their revisions, compare, restore, fork and archive. */
import {
  compareQuery, designCreateBody, designListQuery, designParams, designUpdateBody, forkBody, restoreBody, revisionCreateBody, revisionParams,
} from '../../../shared/schemas/designs.ts';
import type { PieceSpec } from '../../../shared/engine/types.ts';
import { workshopIdParams } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { currentUser } from '../../auth/user.ts';
import type { FeatureDeps } from '../context.ts';
import { createDesignService } from './designs.service.ts';

export function designRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createDesignService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/workshops/:workshopId/designs',
      access: { kind: 'member', action: 'design.read', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        res.json(await service.list(workshopId, currentUser(req).id, designListQuery.parse(req.query)));
      },
    },
    {
      method: 'post',
      path: '/workshops/:workshopId/designs',
      access: { kind: 'member', action: 'design.create', scope: 'workshop' },
      handler: async (req, res) => {
        const { workshopId } = workshopIdParams.parse(req.params);
        const body = designCreateBody.parse(req.body);
        res.status(201).json(await service.create(workshopId, currentUser(req).id, { ...body, spec: body.spec as PieceSpec }));
      },
    },
    {
      method: 'get',
      path: '/designs/:designId',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.json(await service.detail(designId, currentUser(req).id));
      },
    },
    {
      method: 'patch',
      path: '/designs/:designId',
      access: { kind: 'member', action: 'design.edit', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        const { title } = designUpdateBody.parse(req.body);
        res.json(await service.rename(designId, title, currentUser(req).id));
      },
    },
    {
      method: 'get',
      path: '/designs/:designId/revisions',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.json({ revisions: await service.revisions(designId) });
      },
    },
    {
      method: 'post',
      path: '/designs/:designId/revisions',
      access: { kind: 'member', action: 'design.edit', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        const body = revisionCreateBody.parse(req.body);
        res.status(201).json(await service.save(designId, currentUser(req).id, { ...body, spec: body.spec as PieceSpec }));
      },
    },
    {
      method: 'get',
      path: '/designs/:designId/revisions/:number',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: async (req, res) => {
        const { designId, number } = revisionParams.parse(req.params);
        res.json(await service.revision(designId, number));
      },
    },
    {
      method: 'get',
      path: '/designs/:designId/compare',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        const { from, to } = compareQuery.parse(req.query);
        res.json(await service.compare(designId, from, to));
      },
    },
    {
      method: 'post',
      path: '/designs/:designId/restore',
      access: { kind: 'member', action: 'design.edit', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.status(201).json(await service.restore(designId, currentUser(req).id, restoreBody.parse(req.body)));
      },
    },
    {
      method: 'post',
      path: '/designs/:designId/fork',
      access: { kind: 'member', action: 'design.fork', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.status(201).json(await service.fork(designId, currentUser(req).id, forkBody.parse(req.body)));
      },
    },
    {
      method: 'post',
      path: '/designs/:designId/archive',
      access: { kind: 'member', action: 'design.archive', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.json(await service.setArchived(designId, true, currentUser(req).id));
      },
    },
    {
      method: 'post',
      path: '/designs/:designId/unarchive',
      access: { kind: 'member', action: 'design.archive', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.json(await service.setArchived(designId, false, currentUser(req).id));
      },
    },
  ];
}
