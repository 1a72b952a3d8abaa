/** Workshops and their members. */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { Role } from '../../../shared/permissions.ts';
import type { Member, Workshop } from '../../../shared/schemas/workshops.ts';
import type { Models } from '../../db/models/index.ts';
import { HttpError, notFound } from '../../http/HttpError.ts';

type WorkshopListRow = { id: string; name: string; role: Role; memberCount: number; designCount: number; createdAt: Date };

const WORKSHOP_SELECT = `
  SELECT w.id, w.name, m.role, w.created_at AS "createdAt",
    (SELECT count(*) FROM memberships x WHERE x.workshop_id = w.id) AS "memberCount",
    (SELECT count(*) FROM designs d WHERE d.workshop_id = w.id AND d.archived_at IS NULL) AS "designCount"
  FROM workshops w JOIN memberships m ON m.workshop_id = w.id AND m.user_id = :userId`;

function toWorkshop(row: WorkshopListRow): Workshop {
  return { ...row, memberCount: Number(row.memberCount), designCount: Number(row.designCount), createdAt: row.createdAt.toISOString() };
}

export function createWorkshopService(sequelize: Sequelize, models: Models) {
  async function ownerCount(workshopId: string, transaction: Transaction): Promise<number> {
    return models.Membership.count({ where: { workshopId, role: 'owner' }, transaction });
  }

  return {
    async listForUser(userId: string): Promise<Workshop[]> {
      const rows = await sequelize.query<WorkshopListRow>(`${WORKSHOP_SELECT} ORDER BY w.name, w.id`, { type: QueryTypes.SELECT, replacements: { userId } });
      return rows.map(toWorkshop);
    },

    async get(workshopId: string, userId: string): Promise<Workshop> {
      const rows = await sequelize.query<WorkshopListRow>(`${WORKSHOP_SELECT} WHERE w.id = :workshopId`, { type: QueryTypes.SELECT, replacements: { userId, workshopId } });
      if (!rows[0]) throw notFound('Workshop');
      return toWorkshop(rows[0]);
    },

    /** A new workshop with its creator as owner. */
    async create(name: string, userId: string): Promise<Workshop> {
      const workshop = await sequelize.transaction(async (transaction) => {
        const created = await models.Workshop.create({ name }, { transaction });
        await models.Membership.create({ workshopId: created.id, userId, role: 'owner' }, { transaction });
        return created;
      });
      return this.get(workshop.id, userId);
    },

    async rename(workshopId: string, name: string, userId: string): Promise<Workshop> {
      await models.Workshop.update({ name }, { where: { id: workshopId } });
      return this.get(workshopId, userId);
    },

    /** Deletes the workshop with its designs, revisions, comments and invitations. */
    async remove(workshopId: string): Promise<void> {
      await models.Workshop.destroy({ where: { id: workshopId } });
    },

    async members(workshopId: string): Promise<Member[]> {
      const rows = await sequelize.query<{ id: string; name: string; email: string; role: Role; joinedAt: Date }>(
        `SELECT u.id, u.name, u.email, m.role, m.created_at AS "joinedAt"
         FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.workshop_id = :workshopId ORDER BY u.name, u.id`,
        { type: QueryTypes.SELECT, replacements: { workshopId } },
      );
      return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() }));
    },

    /** Change a member's role; a workshop always keeps at least one owner. */
    async setRole(workshopId: string, userId: string, role: Role): Promise<Member> {
      await sequelize.transaction(async (transaction) => {
        await sequelize.query('SELECT id FROM workshops WHERE id = :workshopId FOR UPDATE', { replacements: { workshopId }, transaction });
        const membership = await models.Membership.findOne({ where: { workshopId, userId }, transaction });
        if (!membership) throw notFound('Member');
        if (membership.role === 'owner' && role !== 'owner' && (await ownerCount(workshopId, transaction)) === 1) {
          throw new HttpError(409, 'last_owner', 'A workshop needs at least one owner; make someone else owner first.');
        }
        await membership.update({ role }, { transaction });
      });
      const member = (await this.members(workshopId)).find((m) => m.id === userId);
      if (!member) throw notFound('Member');
      return member;
    },

    async removeMember(workshopId: string, userId: string): Promise<void> {
      await sequelize.transaction(async (transaction) => {
        await sequelize.query('SELECT id FROM workshops WHERE id = :workshopId FOR UPDATE', { replacements: { workshopId }, transaction });
        const membership = await models.Membership.findOne({ where: { workshopId, userId }, transaction });
        if (!membership) throw notFound('Member');
        if (membership.role === 'owner' && (await ownerCount(workshopId, transaction)) === 1) {
          throw new HttpError(409, 'last_owner', 'A workshop needs at least one owner; make someone else owner first.');
        }
        await membership.destroy({ transaction });
      });
    },
  };
}

export type WorkshopService = ReturnType<typeof createWorkshopService>;
