import { Router } from 'express';
import { eq } from 'drizzle-orm';
import { invitationAcceptSchema } from '../../../shared/schemas/auth';
import { hashPassword } from '../../auth/passwords';
import type { AppContext } from '../../context';
import { users } from '../../db/schema/index';
import { HttpError } from '../../http-error';
import { parse } from '../../middleware/parse';
import { recordAudit } from '../audit/audit.service';
import { consumeToken, peekToken } from '../auth/tokens.service';
import { findUserById, toSessionUser } from '../users/user-records';

const gone = (): HttpError =>
  new HttpError(404, 'not_found', 'This invitation has expired or was already used. Ask your administrator to send a new one.');

export function invitationsRouter(ctx: AppContext): Router {
  const r = Router();

  r.get('/invitations/:token', async (req, res) => {
    const userId = await peekToken(ctx.db, String(req.params.token), 'invitation');
    const user = userId === null ? undefined : await findUserById(ctx.db, userId);
    if (!user || user.status === 'deactivated') throw gone();
    res.json({ email: user.email, name: user.name, role: user.role });
  });

  r.post('/invitations/:token/accept', async (req, res) => {
    const body = parse(invitationAcceptSchema, req.body);
    const passwordHash = await hashPassword(body.password);
    const userId = await consumeToken(ctx.db, String(req.params.token), 'invitation');
    const user = userId === null ? undefined : await findUserById(ctx.db, userId);
    if (!user || user.status === 'deactivated') throw gone();
    await ctx.db.update(users).set({ passwordHash, name: body.name, status: 'active', lastSignInAt: new Date() }).where(eq(users.id, user.id));
    const sessionUser = toSessionUser({ ...user, name: body.name });
    await new Promise<void>((resolve, reject) => req.login(sessionUser, (err) => (err ? reject(err) : resolve())));
    await recordAudit(ctx.db, { action: 'invitation_accepted', actor: sessionUser, ip: req.ip });
    res.json({ user: sessionUser });
  });

  return r;
}
