import { Router } from 'express';
import { addMemberSchema, createEngagementSchema, updateEngagementSchema } from '../../../shared/schemas/engagements';
import type { AppContext } from '../../context';
import { currentUser, requireRole } from '../../middleware/auth';
import { idParam, parse } from '../../middleware/parse';
import { loadEngagementFor } from './engagement-access';
import {
  addMember,
  createEngagement,
  describeEngagement,
  listEngagements,
  listMembers,
  removeMember,
  updateEngagement,
} from './engagements.service';

export function engagementsRouter(ctx: AppContext): Router {
  const r = Router();
  const load = (req: Parameters<Parameters<typeof r.get>[1]>[0]) =>
    loadEngagementFor(ctx.db, currentUser(req), idParam(req.params.id, 'That engagement'));

  r.get('/engagements', async (req, res) => {
    res.json({ engagements: await listEngagements(ctx, currentUser(req)) });
  });
  r.post('/engagements', requireRole('admin'), async (req, res) => {
    const engagement = await createEngagement(ctx, parse(createEngagementSchema, req.body), currentUser(req), req.ip);
    res.status(201).json({ engagement });
  });
  r.get('/engagements/:id', async (req, res) => {
    res.json({ engagement: await describeEngagement(ctx, await load(req)) });
  });
  r.patch('/engagements/:id', requireRole('admin'), async (req, res) => {
    const row = await load(req);
    res.json({ engagement: await updateEngagement(ctx, row, parse(updateEngagementSchema, req.body), currentUser(req), req.ip) });
  });
  r.get('/engagements/:id/members', async (req, res) => {
    res.json({ members: await listMembers(ctx, (await load(req)).id) });
  });
  r.post('/engagements/:id/members', requireRole('admin'), async (req, res) => {
    const row = await load(req);
    const { userId } = parse(addMemberSchema, req.body);
    res.status(201).json({ member: await addMember(ctx, row, userId, currentUser(req), req.ip) });
  });
  r.delete('/engagements/:id/members/:userId', requireRole('admin'), async (req, res) => {
    const row = await load(req);
    await removeMember(ctx, row, idParam(req.params.userId, 'That member'), currentUser(req), req.ip);
    res.status(204).end();
  });
  return r;
}
