import { eq, sql } from 'drizzle-orm';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { SessionUser } from '../../shared/schemas/auth';
import type { Db } from '../db/client';
import { users } from '../db/schema/index';
import { findUserByEmail, toSessionUser } from '../routes/users/user-records';
import { verifyPassword } from './passwords';

/**
 * passport-local checks e-mail + password; the session stores only the user id, and every
 * request reloads the user so a deactivation or role change takes effect at once.
 */
export function configurePassport(db: Db): passport.PassportStatic {
  const p = new passport.Passport();
  p.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      findUserByEmail(db, email)
        .then(async (user) => {
          const usable = user && user.status === 'active' ? user.passwordHash : null;
          const ok = await verifyPassword(usable, password);
          done(null, ok && user ? toSessionUser(user) : false);
        })
        .catch(done);
    }),
  );
  p.serializeUser((user, done) => done(null, (user as SessionUser).id));
  // Runs on every signed-in request: the SQL is built once, not per call.
  const userById = db.select().from(users).where(eq(users.id, sql.placeholder('id'))).prepare();
  p.deserializeUser((id: number, done) => {
    userById
      .execute({ id })
      .then(([u]) => done(null, u && u.status === 'active' ? toSessionUser(u) : false))
      .catch(done);
  });
  return p as unknown as passport.PassportStatic;
}
