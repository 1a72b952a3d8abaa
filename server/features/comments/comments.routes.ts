/** Comments on a design (optionally pinned to a revision and a part) and reviewers' approvals. */
import { approvalCreateBody, commentCreateBody, commentListQuery } from '../../../shared/schemas/comments.ts';
import { designParams } from '../../../shared/schemas/designs.ts';
import type { RouteDef } from '../../auth/access.ts';
import { handle } from '../../http/handle.ts';
import type { FeatureDeps } from '../context.ts';
import { createCommentService } from './comments.service.ts';

export function commentRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createCommentService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/designs/:designId/comments',
      access: { kind: 'member', action: 'comment.read', scope: 'design' },
      handler: handle({ params: designParams, query: commentListQuery }, async ({ params, query }) => ({ comments: await service.list(params.designId, query) })),
    },
    {
      method: 'post',
      path: '/designs/:designId/comments',
      access: { kind: 'member', action: 'comment.create', scope: 'design' },
      handler: handle({ params: designParams, body: commentCreateBody, status: 201 }, ({ params, body, userId }) => service.create(params.designId, userId, body)),
    },
    {
      method: 'get',
      path: '/designs/:designId/approvals',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: handle({ params: designParams }, async ({ params }) => ({ approvals: await service.approvals(params.designId) })),
    },
    {
      method: 'post',
      path: '/designs/:designId/approvals',
      access: { kind: 'member', action: 'approval.decide', scope: 'design' },
      handler: handle({ params: designParams, body: approvalCreateBody, status: 201 }, ({ params, body, userId }) => service.decide(params.designId, userId, body)),
    },
  ];
}
