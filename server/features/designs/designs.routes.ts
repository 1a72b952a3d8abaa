/** Designs in a workshop, their revisions, compare, restore, fork and archive. */
import {
  compareQuery, designCreateBody, designListQuery, designParams, designUpdateBody, forkBody, restoreBody, revisionCreateBody, revisionParams,
} from '../../../shared/schemas/designs.ts';
import type { PieceSpec } from '../../../shared/engine/types.ts';
import { workshopIdParams } from '../../../shared/schemas/workshops.ts';
import type { RouteDef } from '../../auth/access.ts';
import { handle } from '../../http/handle.ts';
import type { FeatureDeps } from '../context.ts';
import { createDesignService } from './designs.service.ts';

export function designRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createDesignService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/workshops/:workshopId/designs',
      access: { kind: 'member', action: 'design.read', scope: 'workshop' },
      handler: handle({ params: workshopIdParams, query: designListQuery }, ({ params, query, userId }) => service.list(params.workshopId, userId, query)),
    },
    {
      method: 'post',
      path: '/workshops/:workshopId/designs',
      access: { kind: 'member', action: 'design.create', scope: 'workshop' },
      handler: handle({ params: workshopIdParams, body: designCreateBody, status: 201 }, ({ params, body, userId }) => service.create(params.workshopId, userId, { ...body, spec: body.spec as PieceSpec })),
    },
    {
      method: 'get',
      path: '/designs/:designId',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: handle({ params: designParams }, ({ params, userId }) => service.detail(params.designId, userId)),
    },
    {
      method: 'patch',
      path: '/designs/:designId',
      access: { kind: 'member', action: 'design.edit', scope: 'design' },
      handler: handle({ params: designParams, body: designUpdateBody }, ({ params, body, userId }) => service.rename(params.designId, body.title, userId)),
    },
    {
      method: 'get',
      path: '/designs/:designId/revisions',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: handle({ params: designParams }, async ({ params }) => ({ revisions: await service.revisions(params.designId) })),
    },
    {
      method: 'post',
      path: '/designs/:designId/revisions',
      access: { kind: 'member', action: 'design.edit', scope: 'design' },
      handler: handle({ params: designParams, body: revisionCreateBody, status: 201 }, ({ params, body, userId }) => service.save(params.designId, userId, { ...body, spec: body.spec as PieceSpec })),
    },
    {
      method: 'get',
      path: '/designs/:designId/revisions/:number',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: handle({ params: revisionParams }, ({ params }) => service.revision(params.designId, params.number)),
    },
    {
      method: 'get',
      path: '/designs/:designId/compare',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: handle({ params: designParams, query: compareQuery }, ({ params, query }) => service.compare(params.designId, query.from, query.to)),
    },
    {
      method: 'post',
      path: '/designs/:designId/restore',
      access: { kind: 'member', action: 'design.edit', scope: 'design' },
      handler: handle({ params: designParams, body: restoreBody, status: 201 }, ({ params, body, userId }) => service.restore(params.designId, userId, body)),
    },
    {
      method: 'post',
      path: '/designs/:designId/fork',
      access: { kind: 'member', action: 'design.fork', scope: 'design' },
      handler: handle({ params: designParams, body: forkBody, status: 201 }, ({ params, body, userId }) => service.fork(params.designId, userId, body)),
    },
    {
      method: 'post',
      path: '/designs/:designId/archive',
      access: { kind: 'member', action: 'design.archive', scope: 'design' },
      handler: handle({ params: designParams }, ({ params, userId }) => service.setArchived(params.designId, true, userId)),
    },
    {
      method: 'post',
      path: '/designs/:designId/unarchive',
      access: { kind: 'member', action: 'design.archive', scope: 'design' },
      handler: handle({ params: designParams }, ({ params, userId }) => service.setArchived(params.designId, false, userId)),
    },
  ];
}
