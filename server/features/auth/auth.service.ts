/** Accounts: registration, password reset by e-mailed one-time token. */
import { Op, type Sequelize } from 'sequelize';
import type { Models } from '../../db/models/index.ts';
import { hashPassword, type HashCost } from '../../auth/password.ts';
import { hashToken, newToken } from '../../auth/tokens.ts';
import { HttpError } from '../../http/HttpError.ts';
import type { Mailer } from '../mail/mailer.ts';

/** How long a reset link works. */
export const RESET_TOKEN_TTL_MS = 60 * 60 * 1000;

export function createAuthService(sequelize: Sequelize, models: Models, mailer: Mailer, publicUrl: string, cost: HashCost) {
  return {
    async register(input: { email: string; name: string; password: string }): Promise<Express.User> {
      const passwordHash = await hashPassword(input.password, cost);
      const [user, created] = await models.User.findOrCreate({
        where: { email: input.email },
        defaults: { email: input.email, name: input.name, passwordHash },
      });
      if (!created) throw new HttpError(409, 'email_taken', 'An account with this e-mail already exists; sign in or reset the password.');
      return { id: user.id, email: user.email, name: user.name };
    },

    /** Sends a reset link when the account exists; says nothing either way, so e-mails cannot be probed. */
    async requestPasswordReset(email: string): Promise<void> {
      const user = await models.User.findOne({ where: { email } });
      if (!user) return;
      const { token, hash } = newToken();
      await models.PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt: new Date(Date.now() + RESET_TOKEN_TTL_MS) });
      await mailer.send({
        to: user.email,
        subject: 'Reset your Casewright password',
        text: [
          `Hello ${user.name},`,
          '',
          'Someone asked to reset the password of your Casewright account. To choose a new one, open this link within an hour:',
          '',
          `${publicUrl}/reset-password?token=${token}`,
          '',
          'The link works once. If you did not ask for this, ignore this message; your password stays as it is.',
        ].join('\n'),
      });
    },

    /** Set a new password with a reset token; the token then stops working and every session of the account ends. */
    async confirmPasswordReset(token: string, password: string): Promise<void> {
      const passwordHash = await hashPassword(password, cost);
      await sequelize.transaction(async (transaction) => {
        const reset = await models.PasswordReset.findOne({
          where: { tokenHash: hashToken(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
          lock: transaction.LOCK.UPDATE,
          transaction,
        });
        if (!reset) throw new HttpError(400, 'invalid_token', 'token: this reset link is unknown, already used or expired; ask for a new one.', [{ path: 'token', message: 'unknown, used or expired' }]);
        await reset.update({ usedAt: new Date() }, { transaction });
        await models.User.update({ passwordHash }, { where: { id: reset.userId }, transaction });
        await sequelize.query(`DELETE FROM session WHERE sess->'passport'->>'user' = :userId`, { replacements: { userId: reset.userId }, transaction });
      });
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
