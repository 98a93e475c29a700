import type { IncomingMessage } from 'node:http';
import type { Request } from 'express';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { SessionUser } from '../../shared/schemas/auth';
import type { Db } from '../db/client';
import { findUserByEmail, findUserById, toSessionUser } from '../routes/users/user-records';
import { verifyPassword } from './passwords';
import type { SessionStore } from './session-store';

/**
 * passport-local checks e-mail + password; the session stores only the user id, and every
 * request reads the user with its session (session-store.ts), so a deactivation or role change
 * takes effect at the next request (within the session read cache's second in other processes).
 */
export function configurePassport(db: Db, store: Pick<SessionStore, 'takeUser'>): passport.PassportStatic {
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
  // Runs on every signed-in request: the session store has usually just read the user with the
  // session (one query); otherwise it is read here.
  // Three parameters: passport then passes the request first (passport/lib/authenticator.js).
  p.deserializeUser((req: IncomingMessage, id: number, done: (err: unknown, user?: SessionUser | false) => void) => {
    const read = store.takeUser((req as Request).sessionID);
    const found = read && read.id === id ? Promise.resolve(read) : findUserById(db, id);
    found.then((u) => done(null, u && u.status === 'active' ? toSessionUser(u) : false)).catch(done);
  });
  return p as unknown as passport.PassportStatic;
}
