/** Comments on a design (optionally pinned to a revision and a part) and reviewers' approvals. */
import { approvalCreateBody, commentCreateBody, commentListQuery } from '../../../shared/schemas/comments.ts';
import { designParams } from '../../../shared/schemas/designs.ts';
import type { RouteDef } from '../../auth/access.ts';
import { currentUser } from '../../auth/user.ts';
import type { FeatureDeps } from '../context.ts';
import { createCommentService } from './comments.service.ts';

export function commentRoutes(deps: FeatureDeps): RouteDef[] {
  const service = createCommentService(deps.sequelize, deps.models);
  return [
    {
      method: 'get',
      path: '/designs/:designId/comments',
      access: { kind: 'member', action: 'comment.read', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.json({ comments: await service.list(designId, commentListQuery.parse(req.query)) });
      },
    },
    {
      method: 'post',
      path: '/designs/:designId/comments',
      access: { kind: 'member', action: 'comment.create', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.status(201).json(await service.create(designId, currentUser(req).id, commentCreateBody.parse(req.body)));
      },
    },
    {
      method: 'get',
      path: '/designs/:designId/approvals',
      access: { kind: 'member', action: 'design.read', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.json({ approvals: await service.approvals(designId) });
      },
    },
    {
      method: 'post',
      path: '/designs/:designId/approvals',
      access: { kind: 'member', action: 'approval.decide', scope: 'design' },
      handler: async (req, res) => {
        const { designId } = designParams.parse(req.params);
        res.status(201).json(await service.decide(designId, currentUser(req).id, approvalCreateBody.parse(req.body)));
      },
    },
  ];
}
