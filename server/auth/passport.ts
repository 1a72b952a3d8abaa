/**
 * Passport with the local strategy (e-mail and password). One Passport instance per app, so
 * several apps can share a process in tests. The session holds only the user's id.
 */
import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Models } from '../db/models/index.ts';
import { verifyPassword, type HashCost } from './password.ts';

export function createPassport(models: Models, cost: HashCost) {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      models.User.findOne({ where: { email: email.toLowerCase() } })
        .then(async (user) => {
          const ok = await verifyPassword(user?.passwordHash ?? null, password, cost);
          done(null, ok && user ? { id: user.id, email: user.email, name: user.name } : false);
        })
        .catch(done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    models.User.findByPk(id, { attributes: ['id', 'email', 'name'] })
      .then((user) => done(null, user ? { id: user.id, email: user.email, name: user.name } : false))
      .catch(done);
  });
  return passport;
}
