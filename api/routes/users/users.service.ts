import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { InviteUser, UpdateUser, User } from '../../../shared/schemas/users';
import type { AppContext } from '../../context';
import { users } from '../../db/schema/index';
import { HttpError, notFound } from '../../http-error';
import { accessLinkMail, invitationMail } from '../../mail/messages';
import { recordAudit } from '../audit/audit.service';
import { issueToken } from '../auth/tokens.service';
import { findUserByEmail, findUserById, toUser } from './user-records';

export async function listUsers(ctx: AppContext): Promise<User[]> {
  const rows = await ctx.db.select().from(users).orderBy(users.name);
  return rows.map(toUser);
}

/** Sends (or re-sends) an invitation link; also how an admin resets someone's access. */
export async function sendInvitation(ctx: AppContext, userId: number, by: SessionUser, ip?: string): Promise<void> {
  const user = await findUserById(ctx.db, userId);
  if (!user) throw notFound('That person');
  if (user.status === 'deactivated') throw new HttpError(409, 'conflict', 'Reactivate this person before sending an invitation.');
  const token = await issueToken(ctx.db, user.id, 'invitation');
  const link = `${ctx.config.publicUrl}/invitations/${token}`;
  await ctx.outbox.enqueue(user.status === 'active' ? accessLinkMail(user.email, user.name, link, by.name) : invitationMail(user.email, user.name, link, by.name));
  await recordAudit(ctx.db, { action: 'user_invited', actor: by, subject: user.email, detail: { role: user.role }, ip });
}

export async function inviteUser(ctx: AppContext, input: InviteUser, by: SessionUser, ip?: string): Promise<User> {
  if (await findUserByEmail(ctx.db, input.email)) {
    throw new HttpError(409, 'conflict', 'Someone with this e-mail address already has an account.', [
      { path: 'email', message: 'Already has an account' },
    ]);
  }
  const [res] = await ctx.db.insert(users).values({ ...input, status: 'invited', createdAt: new Date() });
  await sendInvitation(ctx, res.insertId, by, ip);
  return toUser((await findUserById(ctx.db, res.insertId))!);
}

export async function updateUser(ctx: AppContext, id: number, patch: UpdateUser, by: SessionUser, ip?: string): Promise<User> {
  const user = await findUserById(ctx.db, id);
  if (!user) throw notFound('That person');
  if (id === by.id && (patch.active === false || (patch.role && patch.role !== 'admin'))) {
    throw new HttpError(409, 'conflict', 'You cannot remove your own administrator access; ask another administrator.');
  }
  const set: Partial<typeof users.$inferInsert> = { version: user.version + 1 };
  const audits: Parameters<typeof recordAudit>[1][] = [];
  if (patch.name !== undefined && patch.name !== user.name) {
    set.name = patch.name;
    audits.push({ action: 'user_renamed', actor: by, subject: user.email, detail: { from: user.name, to: patch.name }, ip });
  }
  if (patch.role !== undefined && patch.role !== user.role) {
    set.role = patch.role;
    audits.push({ action: 'user_role_changed', actor: by, subject: user.email, detail: { from: user.role, to: patch.role }, ip });
  }
  if (patch.active === false && user.status !== 'deactivated') {
    set.status = 'deactivated';
    audits.push({ action: 'user_deactivated', actor: by, subject: user.email, ip });
  } else if (patch.active === true && user.status === 'deactivated') {
    set.status = user.passwordHash ? 'active' : 'invited';
    audits.push({ action: 'user_reactivated', actor: by, subject: user.email, ip });
  }
  await ctx.db.update(users).set(set).where(eq(users.id, id));
  ctx.sessionStore.forgetUser(id);
  for (const a of audits) await recordAudit(ctx.db, a);
  if (set.status === 'deactivated') await endSessionsOf(ctx, id);
  return toUser((await findUserById(ctx.db, id))!);
}

/** A deactivated person is signed out everywhere at once (sessions hold only the user id). */
async function endSessionsOf(ctx: AppContext, userId: number): Promise<void> {
  await ctx.pool.query(`DELETE FROM sessions WHERE JSON_VALUE(data, '$.passport.user') = ?`, [userId]);
}
