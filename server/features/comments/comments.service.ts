/** Comments on designs, and reviewers' decisions on revisions. */
import { QueryTypes, type Sequelize } from 'sequelize';
import type { Approval, Comment } from '../../../shared/schemas/comments.ts';
import type { Models } from '../../db/models/index.ts';
import { badRequest, notFound } from '../../http/HttpError.ts';

type CommentOut = {
  id: string; designId: string; revision: number | null; partId: string | null; body: string; createdAt: Date;
  authorId: string | null; authorName: string | null; authorEmail: string | null;
};
type ApprovalOut = {
  id: string; designId: string; revision: number; decision: Approval['decision']; note: string; createdAt: Date;
  reviewerId: string | null; reviewerName: string | null; reviewerEmail: string | null;
};

const person = (id: string | null, name: string | null, email: string | null) => (id ? { id, name: name ?? '', email: email ?? '' } : null);

export function createCommentService(sequelize: Sequelize, models: Models) {
  async function requireRevision(designId: string, number: number) {
    const found = await models.Revision.count({ where: { designId, number } });
    if (!found) throw badRequest(`revision: this design has no revision ${number}`, [{ path: 'revision', message: `no revision ${number}` }]);
  }

  async function commentList(where: string, replacements: Record<string, unknown>): Promise<Comment[]> {
    const rows = await sequelize.query<CommentOut>(
      `SELECT c.id, c.design_id AS "designId", c.revision_number AS revision, c.part_id AS "partId", c.body, c.created_at AS "createdAt",
         u.id AS "authorId", u.name AS "authorName", u.email AS "authorEmail"
       FROM comments c LEFT JOIN users u ON u.id = c.author_id WHERE ${where} ORDER BY c.created_at, c.id`,
      { type: QueryTypes.SELECT, replacements },
    );
    return rows.map((r) => ({
      id: r.id, designId: r.designId, revision: r.revision, partId: r.partId, body: r.body,
      author: person(r.authorId, r.authorName, r.authorEmail), createdAt: r.createdAt.toISOString(),
    }));
  }

  async function approvalList(where: string, replacements: Record<string, unknown>): Promise<Approval[]> {
    const rows = await sequelize.query<ApprovalOut>(
      `SELECT a.id, a.design_id AS "designId", a.revision_number AS revision, a.decision, a.note, a.created_at AS "createdAt",
         u.id AS "reviewerId", u.name AS "reviewerName", u.email AS "reviewerEmail"
       FROM approvals a LEFT JOIN users u ON u.id = a.reviewer_id WHERE ${where} ORDER BY a.created_at DESC, a.id`,
      { type: QueryTypes.SELECT, replacements },
    );
    return rows.map((r) => ({
      id: r.id, designId: r.designId, revision: r.revision, decision: r.decision, note: r.note,
      reviewer: person(r.reviewerId, r.reviewerName, r.reviewerEmail), createdAt: r.createdAt.toISOString(),
    }));
  }

  return {
    list(designId: string, filter: { revision?: number; partId?: string }): Promise<Comment[]> {
      const where = ['c.design_id = :designId'];
      if (filter.revision !== undefined) where.push('c.revision_number = :revision');
      if (filter.partId !== undefined) where.push('c.part_id = :partId');
      return commentList(where.join(' AND '), { designId, revision: filter.revision ?? null, partId: filter.partId ?? null });
    },

    /** A comment on the design; a part comment without a revision is pinned to the current head. */
    async create(designId: string, authorId: string, input: { body: string; revision?: number; partId?: string }): Promise<Comment> {
      let revision = input.revision ?? null;
      if (revision !== null) await requireRevision(designId, revision);
      if (revision === null && input.partId !== undefined) {
        const design = await models.Design.findByPk(designId);
        if (!design) throw notFound('Design');
        revision = design.headRevision;
      }
      const comment = await models.Comment.create({ designId, revisionNumber: revision, partId: input.partId ?? null, authorId, body: input.body });
      const [created] = await commentList('c.id = :id', { id: comment.id });
      if (!created) throw notFound('Comment');
      return created;
    },

    approvals(designId: string): Promise<Approval[]> {
      return approvalList('a.design_id = :designId', { designId });
    },

    /**
     * Record a reviewer's decision on one revision and recompute the design's approved revision:
     * the newest revision whose latest decision is an approval.
     */
    async decide(designId: string, reviewerId: string, input: { revision: number; decision: Approval['decision']; note: string }): Promise<Approval> {
      await requireRevision(designId, input.revision);
      const id = await sequelize.transaction(async (transaction) => {
        await sequelize.query('SELECT id FROM designs WHERE id = :designId FOR UPDATE', { replacements: { designId }, transaction });
        const approval = await models.Approval.create({ designId, revisionNumber: input.revision, reviewerId, decision: input.decision, note: input.note }, { transaction });
        await sequelize.query(
          `UPDATE designs SET approved_revision = (
             SELECT max(revision_number) FROM (
               SELECT DISTINCT ON (revision_number) revision_number, decision FROM approvals
               WHERE design_id = :designId ORDER BY revision_number, created_at DESC, id DESC
             ) latest WHERE decision = 'approved')
           WHERE id = :designId`,
          { replacements: { designId }, transaction },
        );
        return approval.id;
      });
      const [created] = await approvalList('a.id = :id', { id });
      if (!created) throw notFound('Approval');
      return created;
    },
  };
}
