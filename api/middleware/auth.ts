import type {} from 'passport';
import type { Request, RequestHandler } from 'express';
import type { Role } from '../../shared/schemas/roles';
import type { SessionUser } from '../../shared/schemas/auth';
import { HttpError } from '../http-error';

/** The signed-in user, or a 401 error. */
export function currentUser(req: Request): SessionUser {
  const user = req.user as SessionUser | undefined;
  if (!user) throw new HttpError(401, 'unauthenticated', 'Sign in to continue.');
  return user;
}

export const requireUser: RequestHandler = (req, _res, next) => {
  currentUser(req);
  next();
};

/** Role gate; membership of an engagement is checked separately (see engagement-access.ts). */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const user = currentUser(req);
    if (!roles.includes(user.role)) throw new HttpError(403, 'forbidden', 'Your role does not allow this.');
    next();
  };
}
