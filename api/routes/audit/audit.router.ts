import { Router } from 'express';
import { auditQuerySchema } from '../../../shared/schemas/audit';
import type { AppContext } from '../../context';
import { requireRole } from '../../middleware/auth';
import { parse } from '../../middleware/parse';
import { listAudit } from './audit.service';

export function auditRouter(ctx: AppContext): Router {
  const r = Router();
  r.get('/audit', requireRole('admin'), async (req, res) => {
    res.json(await listAudit(ctx.db, parse(auditQuerySchema, req.query)));
  });
  return r;
}
