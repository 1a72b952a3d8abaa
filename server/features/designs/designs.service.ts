/**
 * Designs and their revisions. A save never overwrites: it adds revision head+1 inside a
 * transaction that locks the design row, so of many saves from the same base exactly one
 * wins and the others get 409 with the head they must rebase on. Revision numbers have no gaps.
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { can } from '../../../shared/permissions.ts';
import type { PieceSpec } from '../../../shared/engine/types.ts';
import type { CompareResponse, DesignCard, DesignDetail, DesignListItem, DesignListQuery, Revision, RevisionInfo } from '../../../shared/schemas/designs.ts';
import { isInputError } from '../../../shared/errors.ts';
import type { Models } from '../../db/models/index.ts';
import { HttpError, badRequest, conflict, forbidden, notFound } from '../../http/HttpError.ts';
import { CARD_SELECT, REVISION_SELECT, toCard, toRevisionInfo, type CardRow, type RevisionRowOut } from './designs.queries.ts';
import { buildRevision, comparePieces } from './engine.ts';
import { paramDiff } from './paramDiff.ts';

type SaveInput = { baseRevision: number; spec: PieceSpec; message: string; restoredFrom?: number };

/** A stored revision, its spec typed as the engine's. */
type StoredRevision = Omit<Revision, 'spec'> & { spec: PieceSpec };

function toRevision(row: RevisionRowOut): StoredRevision {
  return { ...toRevisionInfo(row), designId: row.designId, spec: row.spec as PieceSpec };
}

/** `%` and `_` in a search are literal characters, not patterns. */
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export function createDesignService(sequelize: Sequelize, models: Models) {
  async function card(designId: string, viewerId: string, transaction?: Transaction): Promise<DesignCard> {
    const rows = await sequelize.query<CardRow>(`${CARD_SELECT} WHERE d.id = :designId`, {
      type: QueryTypes.SELECT, replacements: { designId, viewerId }, transaction,
    });
    if (!rows[0]) throw notFound('Design');
    return toCard(rows[0]);
  }

  async function revision(designId: string, number: number, transaction?: Transaction): Promise<StoredRevision> {
    const rows = await sequelize.query<RevisionRowOut>(`${REVISION_SELECT} WHERE r.design_id = :designId AND r.number = :number`, {
      type: QueryTypes.SELECT, replacements: { designId, number }, transaction,
    });
    if (!rows[0]) throw notFound(`Revision ${number}`);
    return toRevision(rows[0]);
  }

  function checkKind(spec: PieceSpec, kind: string) {
    if (spec.kind !== kind) throw badRequest(`spec.kind: this design is a ${kind}; fork it to start a different piece`, [{ path: 'spec.kind', message: `must be ${kind}` }]);
  }

  /** Add a revision on top of `baseRevision`; 409 with the current head when the head has moved. */
  async function save(designId: string, userId: string, input: SaveInput): Promise<StoredRevision> {
    const built = buildRevision(input.spec);
    return sequelize.transaction(async (transaction) => {
      const design = await models.Design.findByPk(designId, { lock: transaction.LOCK.UPDATE, transaction });
      if (!design) throw notFound('Design');
      checkKind(input.spec, design.kind);
      if (design.archivedAt) throw conflict('This design is archived; unarchive it before saving.');
      if (design.headRevision !== input.baseRevision) {
        const head = await revision(designId, design.headRevision, transaction);
        throw new HttpError(409, 'stale_revision', `Revision ${head.number} was saved since revision ${input.baseRevision}; load it or fork your changes.`, { head });
      }
      const number = design.headRevision + 1;
      await models.Revision.create(
        { designId, number, spec: input.spec, engineVersion: built.engineVersion, summary: built.summary, authorId: userId, message: input.message, restoredFrom: input.restoredFrom ?? null },
        { transaction },
      );
      design.headRevision = number;
      design.changed('updatedAt', true);
      await design.save({ transaction });
      return revision(designId, number, transaction);
    });
  }

  return {
    card,
    revision,

    /** A page of a workshop's designs as cards, each with its head spec so a grid draws every piece from one request. */
    async list(workshopId: string, viewerId: string, query: DesignListQuery): Promise<{ designs: DesignListItem[]; total: number }> {
      const where = ['d.workshop_id = :workshopId'];
      if (query.kind) where.push('d.kind = :kind');
      if (query.q) where.push(`d.title ILIKE :q ESCAPE '\\'`);
      if (query.authorId) where.push('EXISTS (SELECT 1 FROM revisions x WHERE x.design_id = d.id AND x.author_id = :authorId)');
      if (query.updatedAfter) where.push('d.updated_at >= :updatedAfter');
      if (query.updatedBefore) where.push('d.updated_at < :updatedBefore');
      if (query.archived === 'false') where.push('d.archived_at IS NULL');
      if (query.archived === 'true') where.push('d.archived_at IS NOT NULL');
      const rows = await sequelize.query<CardRow>(
        `${CARD_SELECT} WHERE ${where.join(' AND ')} ORDER BY d.updated_at DESC, d.id LIMIT :limit OFFSET :offset`,
        {
          type: QueryTypes.SELECT,
          replacements: {
            workshopId, viewerId, kind: query.kind ?? null, q: query.q ? likePattern(query.q) : null, authorId: query.authorId ?? null,
            updatedAfter: query.updatedAfter ?? null, updatedBefore: query.updatedBefore ?? null, limit: query.limit, offset: query.offset,
          },
        },
      );
      return { designs: rows.map((row) => ({ ...toCard(row), headSpec: row.headSpec as PieceSpec })), total: Number(rows[0]?.total ?? 0) };
    },

    /** A design with its head revision's spec, and the forks made from it that the viewer may see. */
    async detail(designId: string, viewerId: string): Promise<DesignDetail> {
      const summary = await card(designId, viewerId);
      const headRevision = await revision(designId, summary.head.number);
      const forks = await sequelize.query<{ id: string; title: string; workshopId: string; workshopName: string; fromRevision: number; visible: boolean }>(
        `SELECT f.id, f.title, f.workshop_id AS "workshopId", w.name AS "workshopName", f.origin_revision AS "fromRevision",
           (m.user_id IS NOT NULL) AS visible
         FROM designs f JOIN workshops w ON w.id = f.workshop_id
         LEFT JOIN memberships m ON m.workshop_id = f.workshop_id AND m.user_id = :viewerId
         WHERE f.origin_design_id = :designId ORDER BY f.created_at, f.id`,
        { type: QueryTypes.SELECT, replacements: { designId, viewerId } },
      );
      const visible = forks.filter((f) => f.visible).map(({ visible: _v, ...fork }) => fork);
      return { ...summary, headRevision, forks: visible, hiddenForkCount: forks.length - visible.length };
    },

    async create(workshopId: string, userId: string, input: { title: string; spec: PieceSpec; message: string }): Promise<DesignDetail> {
      const built = buildRevision(input.spec);
      const design = await sequelize.transaction(async (transaction) => {
        const created = await models.Design.create({ workshopId, title: input.title, kind: input.spec.kind, headRevision: 1, createdBy: userId }, { transaction });
        await models.Revision.create(
          { designId: created.id, number: 1, spec: input.spec, engineVersion: built.engineVersion, summary: built.summary, authorId: userId, message: input.message, restoredFrom: null },
          { transaction },
        );
        return created;
      });
      return this.detail(design.id, userId);
    },

    async rename(designId: string, title: string, viewerId: string): Promise<DesignCard> {
      await models.Design.update({ title }, { where: { id: designId } });
      return card(designId, viewerId);
    },

    save,

    async revisions(designId: string): Promise<RevisionInfo[]> {
      const rows = await sequelize.query<RevisionRowOut>(`${REVISION_SELECT} WHERE r.design_id = :designId ORDER BY r.number DESC`, {
        type: QueryTypes.SELECT, replacements: { designId },
      });
      return rows.map(toRevisionInfo);
    },

    /** Parameters changed between two revisions, and the engine's comparison of the parts. */
    async compare(designId: string, fromNumber: number, toNumber: number): Promise<CompareResponse> {
      const [from, to] = await Promise.all([revision(designId, fromNumber), revision(designId, toNumber)]);
      let parts: unknown;
      try {
        parts = comparePieces(from.spec, to.spec);
      } catch (error) {
        // A revision saved by an older engine may no longer build; the parameter diff still stands.
        if (!isInputError(error)) throw error;
        parts = { unavailable: `${error.field}: ${error.message}` };
      }
      const { spec: _a, designId: _b, ...fromInfo } = from;
      const { spec: _c, designId: _d, ...toInfo } = to;
      return { from: fromInfo, to: toInfo, params: paramDiff(from.spec, to.spec), parts };
    },

    /** Make an old revision the head again, as a new revision (history is never rewritten). */
    async restore(designId: string, userId: string, input: { revision: number; baseRevision: number; message?: string }): Promise<StoredRevision> {
      const old = await revision(designId, input.revision);
      return save(designId, userId, {
        baseRevision: input.baseRevision,
        spec: old.spec,
        message: input.message || `Restored revision ${input.revision}`,
        restoredFrom: input.revision,
      });
    },

    /** Start a new design in `targetWorkshopId` from a revision of this one, remembering where it came from. */
    async fork(designId: string, userId: string, input: { workshopId: string; title?: string; revision?: number }): Promise<DesignDetail> {
      const membership = await models.Membership.findOne({ where: { workshopId: input.workshopId, userId } });
      if (!membership) throw notFound('Workshop');
      if (!can(membership.role, 'design.create')) throw forbidden(`A ${membership.role} may not create designs in that workshop.`);
      const source = await models.Design.findByPk(designId);
      if (!source) throw notFound('Design');
      const from = await revision(designId, input.revision ?? source.headRevision);
      const built = buildRevision(from.spec);
      const fork = await sequelize.transaction(async (transaction) => {
        const created = await models.Design.create(
          {
            workshopId: input.workshopId, title: input.title ?? `${source.title} (fork)`, kind: source.kind, headRevision: 1,
            originDesignId: source.id, originRevision: from.number, createdBy: userId,
          },
          { transaction },
        );
        await models.Revision.create(
          {
            designId: created.id, number: 1, spec: from.spec, engineVersion: built.engineVersion, summary: built.summary, authorId: userId,
            message: `Forked from "${source.title}" revision ${from.number}`, restoredFrom: null,
          },
          { transaction },
        );
        return created;
      });
      return this.detail(fork.id, userId);
    },

    async setArchived(designId: string, archived: boolean, viewerId: string): Promise<DesignCard> {
      await models.Design.update({ archivedAt: archived ? new Date() : null }, { where: { id: designId } });
      return card(designId, viewerId);
    },
  };
}

export type DesignService = ReturnType<typeof createDesignService>;
