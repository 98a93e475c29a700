import { eq } from 'drizzle-orm';
import { Router, type Request } from 'express';
import { createAssumptionSchema, updateAssumptionSchema } from '../../../shared/schemas/assumptions';
import type { AppContext } from '../../context';
import { assumptions } from '../../db/schema/index';
import { HttpError, notFound } from '../../http-error';
import { currentUser } from '../../middleware/auth';
import { idParam, parse } from '../../middleware/parse';
import { loadEngagementFor } from '../engagements/engagement-access';
import { assertStudyRole, loadEngagementForStudies, type Access } from '../studies/study-access';
import { createAssumption, deleteAssumption, listAssumptionsFor, updateAssumption, type AssumptionRow } from './assumptions.service';

/** The assumption register of an engagement; same roles as studies (clients never, admins read). */
export function assumptionsRouter(ctx: AppContext): Router {
  const r = Router();
  const engagement = (req: Request, access: Access) => loadEngagementForStudies(ctx.db, currentUser(req), idParam(req.params.id, 'That engagement'), access);
  const assumption = async (req: Request): Promise<AssumptionRow> => {
    const user = currentUser(req);
    assertStudyRole(user, 'write');
    const [row] = await ctx.db.select().from(assumptions).where(eq(assumptions.id, idParam(req.params.id, 'That assumption')));
    if (!row) throw notFound('That assumption');
    try {
      await loadEngagementFor(ctx.db, user, row.engagementId);
    } catch (err) {
      if (err instanceof HttpError && err.status === 404) throw notFound('That assumption');
      throw err;
    }
    return row;
  };

  r.get('/engagements/:id/assumptions', async (req, res) => {
    res.json({ assumptions: await listAssumptionsFor(ctx, currentUser(req), idParam(req.params.id, 'That engagement')) });
  });
  r.post('/engagements/:id/assumptions', async (req, res) => {
    const e = await engagement(req, 'write');
    res.status(201).json({ assumption: await createAssumption(ctx, e, parse(createAssumptionSchema, req.body), currentUser(req), req.ip) });
  });
  r.patch('/assumptions/:id', async (req, res) => {
    const row = await assumption(req);
    res.json(await updateAssumption(ctx, row, parse(updateAssumptionSchema, req.body), currentUser(req), req.ip));
  });
  r.delete('/assumptions/:id', async (req, res) => {
    await deleteAssumption(ctx, await assumption(req), currentUser(req), req.ip);
    res.status(204).end();
  });
  return r;
}
