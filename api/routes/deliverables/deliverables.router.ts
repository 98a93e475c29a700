import { Router } from 'express';
import { and, eq } from 'drizzle-orm';
import type { AppContext } from '../../context';
import { revisions } from '../../db/schema/index';
import { conflict } from '../../http-error';
import { currentUser } from '../../middleware/auth';
import { idParam } from '../../middleware/parse';
import { recordAudit } from '../audit/audit.service';
import { loadRevisionFor } from '../revisions/revision-access';
import { deliverableQuery, isDelivered, listDeliverables } from './deliverables.service';
import { pdfLink } from './pdf-link';

/** Released deliverables and their download links; clients see only their own engagements'. */
export function deliverablesRouter(ctx: AppContext): Router {
  const r = Router();
  r.get('/deliverables', async (req, res) => {
    const q = req.query.engagementId;
    const engagementId = typeof q === 'string' && /^[1-9]\d{0,9}$/.test(q) ? Number(q) : undefined;
    res.json({ deliverables: await listDeliverables(ctx, currentUser(req), engagementId) });
  });
  r.get('/revisions/:id/pdf', async (req, res) => {
    const user = currentUser(req);
    // Membership first (404 for others, and for clients asking about an unreleased revision).
    const rc = await loadRevisionFor(ctx.db, user, idParam(req.params.id, 'That revision'), 'read');
    const [row] = await deliverableQuery(ctx).where(and(eq(revisions.id, rc.revision.id), isDelivered()));
    if (!row?.s3Key) {
      throw conflict(`Revision ${rc.revision.number} is not released; there is no signed PDF yet.`);
    }
    const link = await pdfLink(ctx, row.s3Key, `${rc.study.title} - revision ${rc.revision.number}.pdf`);
    await recordAudit(ctx.db, {
      action: 'deliverable_downloaded',
      actor: user,
      engagementId: rc.engagement.id,
      subject: `${rc.study.title}, revision ${rc.revision.number}`,
      detail: { revisionId: rc.revision.id, fileSha256: row.fileSha256 },
      ip: req.ip,
    });
    res.json(link);
  });
  return r;
}
