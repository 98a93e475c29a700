import { Router } from 'express';
import { inviteUserSchema, updateUserSchema } from '../../../shared/schemas/users';
import type { AppContext } from '../../context';
import { currentUser, requireRole } from '../../middleware/auth';
import { idParam, parse } from '../../middleware/parse';
import { inviteUser, listUsers, sendInvitation, updateUser } from './users.service';

export function usersRouter(ctx: AppContext): Router {
  const r = Router();
  r.use('/users', requireRole('admin'));
  r.get('/users', async (_req, res) => {
    res.json({ users: await listUsers(ctx) });
  });
  r.post('/users', async (req, res) => {
    const user = await inviteUser(ctx, parse(inviteUserSchema, req.body), currentUser(req), req.ip);
    res.status(201).json({ user });
  });
  r.patch('/users/:id', async (req, res) => {
    const user = await updateUser(ctx, idParam(req.params.id, 'That person'), parse(updateUserSchema, req.body), currentUser(req), req.ip);
    res.json({ user });
  });
  r.post('/users/:id/invitation', async (req, res) => {
    await sendInvitation(ctx, idParam(req.params.id, 'That person'), currentUser(req), req.ip);
    res.status(202).json({ ok: true });
  });
  return r;
}
