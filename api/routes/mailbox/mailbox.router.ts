import { Router } from 'express';
import { z } from 'zod';
import { caughtMailSchema } from '../../../shared/schemas/mailbox';
import type { AppContext } from '../../context';
import { HttpError } from '../../http-error';
import { requireRole } from '../../middleware/auth';

/** Admin-only view of what the local SMTP fake caught; off in production (no MAIL_FAKE_URL). */
export function mailboxRouter(ctx: AppContext): Router {
  const r = Router();
  r.get('/admin/mailbox', requireRole('admin'), async (_req, res) => {
    if (!ctx.config.mailFakeUrl) {
      res.json({ enabled: false, messages: [] });
      return;
    }
    const reply = await fetch(`${ctx.config.mailFakeUrl}/messages`, { signal: AbortSignal.timeout(3_000) }).catch(() => null);
    if (!reply?.ok) throw new HttpError(503, 'unavailable', 'The local mail catcher is not answering.');
    const { messages } = z.object({ messages: z.array(caughtMailSchema) }).parse(await reply.json());
    res.json({ enabled: true, messages });
  });
  return r;
}
