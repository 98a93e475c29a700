import { Router } from 'express';
import type { AppContext } from '../../context';
import { currentUser, requireUser } from '../../middleware/auth';
import { receivedPdf, receivePdf } from './receive-pdf';
import { verifyDeliverable } from './verify-deliverable';

/** POST /api/verify: any signed-in person checks a PDF they hold. */
export function verifyRouter(ctx: AppContext): Router {
  const r = Router();
  // Sign-in is checked before the body is read, so anonymous uploads are never buffered.
  r.post('/verify', requireUser, receivePdf, async (req, res) => {
    res.json({ result: await verifyDeliverable(ctx, currentUser(req), receivedPdf(req)) });
  });
  return r;
}
