import { Router, type NextFunction, type Request, type Response } from 'express';
import { eq } from 'drizzle-orm';
import type passport from 'passport';
import {
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  signInBodySchema,
  type SessionUser,
} from '../../../shared/schemas/auth';
import { hashPassword } from '../../auth/passwords';
import type { AppContext } from '../../context';
import { users } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import { passwordResetMail } from '../../mail/messages';
import { currentUser } from '../../middleware/auth';
import { parse } from '../../middleware/parse';
import { recordAudit } from '../audit/audit.service';
import { findUserByEmail } from '../users/user-records';
import { signInLimits } from './sign-in-limits';
import { consumeToken, issueToken } from './tokens.service';

const authenticate = (p: passport.PassportStatic, req: Request, res: Response, next: NextFunction) =>
  new Promise<SessionUser | false>((resolve, reject) => {
    p.authenticate('local', (err: unknown, user: SessionUser | false) => (err ? reject(err) : resolve(user)))(req, res, next);
  });

export function authRouter(ctx: AppContext, p: passport.PassportStatic): Router {
  const r = Router();

  r.post('/auth/sign-in', ...signInLimits(ctx.config.signInLimit), async (req, res, next) => {
    const body = parse(signInBodySchema, req.body);
    req.body = body;
    const user = await authenticate(p, req, res, next);
    if (!user) {
      await recordAudit(ctx.db, { action: 'sign_in_failed', actorEmail: body.email, ip: req.ip });
      throw new HttpError(401, 'invalid_credentials', 'That e-mail and password do not match an active account.');
    }
    // passport 0.7 regenerates the session id at login, so a planted id never becomes signed in.
    await new Promise<void>((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
    await ctx.db.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, user.id));
    await recordAudit(ctx.db, { action: 'sign_in', actor: user, ip: req.ip });
    res.json({ user });
  });

  r.post('/auth/sign-out', async (req, res) => {
    const user = req.user as SessionUser | undefined;
    await new Promise<void>((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    if (user) await recordAudit(ctx.db, { action: 'sign_out', actor: user, ip: req.ip });
    res.clearCookie('sojourn.sid');
    res.status(204).end();
  });

  r.get('/auth/me', (req, res) => {
    res.json({ user: currentUser(req) });
  });

  r.post('/auth/password-reset', async (req, res) => {
    const { email } = parse(passwordResetRequestSchema, req.body);
    const user = await findUserByEmail(ctx.db, email);
    // Same answer whether or not the account exists, so addresses cannot be probed.
    if (user && user.status === 'active') {
      const token = await issueToken(ctx.db, user.id, 'password_reset');
      await ctx.outbox.enqueue(passwordResetMail(user.email, `${ctx.config.publicUrl}/reset-password/${token}`));
      await recordAudit(ctx.db, { action: 'password_reset_requested', actor: user, ip: req.ip });
    }
    res.status(202).json({ ok: true });
  });

  r.post('/auth/password-reset/confirm', async (req, res) => {
    const { token, password } = parse(passwordResetConfirmSchema, req.body);
    const passwordHash = await hashPassword(password);
    const userId = await consumeToken(ctx.db, token, 'password_reset');
    if (userId === null) {
      throw new HttpError(400, 'validation_failed', 'This reset link has expired or was already used. Ask for a new one.', [
        { path: 'token', message: 'Expired or already used' },
      ]);
    }
    await ctx.db.update(users).set({ passwordHash }).where(eq(users.id, userId));
    await recordAudit(ctx.db, { action: 'password_reset_completed', actor: { id: userId, email: '' }, ip: req.ip });
    res.json({ ok: true });
  });

  return r;
}
