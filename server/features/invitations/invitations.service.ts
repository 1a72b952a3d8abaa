/** Invitations: an owner invites an e-mail address with a role; the link's token expires. */
import { QueryTypes, type Sequelize } from 'sequelize';
import type { Role } from '../../../shared/permissions.ts';
import type { Invitation, InvitationPreview } from '../../../shared/schemas/workshops.ts';
import type { Models } from '../../db/models/index.ts';
import { hashToken, newToken } from '../../auth/tokens.ts';
import { HttpError, notFound } from '../../http/HttpError.ts';
import type { Mailer } from '../mail/mailer.ts';

/** How long an invitation link works. */
export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

type InvitationListRow = {
  id: string; email: string; role: Role; expiresAt: Date; acceptedAt: Date | null; createdAt: Date;
  inviterId: string | null; inviterName: string | null; inviterEmail: string | null;
};

export function createInvitationService(sequelize: Sequelize, models: Models, mailer: Mailer, publicUrl: string) {
  async function byToken(token: string) {
    const invitation = await models.Invitation.findOne({ where: { tokenHash: hashToken(token) } });
    if (!invitation) throw notFound('Invitation');
    return invitation;
  }

  return {
    async list(workshopId: string): Promise<Invitation[]> {
      const rows = await sequelize.query<InvitationListRow>(
        `SELECT i.id, i.email, i.role, i.expires_at AS "expiresAt", i.accepted_at AS "acceptedAt", i.created_at AS "createdAt",
           u.id AS "inviterId", u.name AS "inviterName", u.email AS "inviterEmail"
         FROM invitations i LEFT JOIN users u ON u.id = i.invited_by
         WHERE i.workshop_id = :workshopId ORDER BY i.created_at DESC, i.id`,
        { type: QueryTypes.SELECT, replacements: { workshopId } },
      );
      return rows.map((r) => ({
        id: r.id, email: r.email, role: r.role,
        invitedBy: r.inviterId ? { id: r.inviterId, name: r.inviterName ?? '', email: r.inviterEmail ?? '' } : null,
        expiresAt: r.expiresAt.toISOString(), acceptedAt: r.acceptedAt?.toISOString() ?? null, createdAt: r.createdAt.toISOString(),
      }));
    },

    /** Store the invitation and e-mail its link; nothing is stored when the mail cannot be sent. */
    async create(workshopId: string, email: string, role: Role, inviter: Express.User): Promise<Invitation> {
      const alreadyMember = await sequelize.query(
        'SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.workshop_id = :workshopId AND u.email = :email',
        { type: QueryTypes.SELECT, replacements: { workshopId, email } },
      );
      if (alreadyMember.length) throw new HttpError(409, 'already_member', 'email: that person is already a member of this workshop.');
      const workshop = await models.Workshop.findByPk(workshopId);
      if (!workshop) throw notFound('Workshop');
      const { token, hash } = newToken();
      const created = await sequelize.transaction(async (transaction) => {
        const invitation = await models.Invitation.create(
          { workshopId, email, role, tokenHash: hash, invitedBy: inviter.id, expiresAt: new Date(Date.now() + INVITATION_TTL_MS) },
          { transaction },
        );
        await mailer.send({
          to: email,
          subject: `${inviter.name} invited you to ${workshop.name} on Casewright`,
          text: [
            `${inviter.name} invited you to join the workshop "${workshop.name}" on Casewright as a ${role}.`,
            '',
            'Open this link within 7 days to accept (sign in or create an account with this e-mail address first):',
            '',
            `${publicUrl}/invitations/${token}`,
          ].join('\n'),
        });
        return invitation;
      });
      const listed = (await this.list(workshopId)).find((i) => i.id === created.id);
      if (!listed) throw notFound('Invitation');
      return listed;
    },

    async revoke(workshopId: string, invitationId: string): Promise<void> {
      const removed = await models.Invitation.destroy({ where: { id: invitationId, workshopId } });
      if (!removed) throw notFound('Invitation');
    },

    /** What the link shows before accepting: which workshop, which role, still open or not. */
    async preview(token: string): Promise<InvitationPreview> {
      const invitation = await byToken(token);
      const workshop = await models.Workshop.findByPk(invitation.workshopId);
      const inviter = invitation.invitedBy ? await models.User.findByPk(invitation.invitedBy) : null;
      const state = invitation.acceptedAt ? 'accepted' : invitation.expiresAt.getTime() <= Date.now() ? 'expired' : 'open';
      return {
        workshopName: workshop?.name ?? '', email: invitation.email, role: invitation.role,
        invitedBy: inviter?.name ?? null, expiresAt: invitation.expiresAt.toISOString(), state,
      };
    },

    /** Join the workshop with the invited role; the signed-in account must own the invited e-mail. */
    async accept(token: string, user: Express.User): Promise<{ workshopId: string; role: Role }> {
      return sequelize.transaction(async (transaction) => {
        const invitation = await models.Invitation.findOne({ where: { tokenHash: hashToken(token) }, lock: transaction.LOCK.UPDATE, transaction });
        if (!invitation) throw notFound('Invitation');
        if (invitation.acceptedAt) throw new HttpError(410, 'invitation_used', 'This invitation has already been accepted.');
        if (invitation.expiresAt.getTime() <= Date.now()) throw new HttpError(410, 'invitation_expired', 'This invitation has expired; ask the owner for a new one.');
        if (invitation.email !== user.email) {
          throw new HttpError(403, 'wrong_account', `This invitation is for ${invitation.email}; sign in with that e-mail to accept it.`);
        }
        const existing = await models.Membership.findOne({ where: { workshopId: invitation.workshopId, userId: user.id }, transaction });
        if (existing) throw new HttpError(409, 'already_member', 'You are already a member of this workshop.');
        await models.Membership.create({ workshopId: invitation.workshopId, userId: user.id, role: invitation.role }, { transaction });
        await invitation.update({ acceptedAt: new Date(), acceptedBy: user.id }, { transaction });
        return { workshopId: invitation.workshopId, role: invitation.role };
      });
    },
  };
}
