import { Router } from 'express';
import type { AppContext } from '../../context';

const within = <T>(p: Promise<T>, ms: number, fallback: T): Promise<T> =>
  Promise.race([p, new Promise<T>((r) => setTimeout(() => r(fallback), ms).unref())]);

/** Open to anyone (load balancers); reports each dependency without details. 503 when the DB is down. */
export function healthRouter(ctx: AppContext): Router {
  const r = Router();
  r.get('/health', async (_req, res) => {
    const [db, storage, mail] = await Promise.all([
      within(ctx.pool.query('SELECT 1').then(() => true, () => false), 2_000, false),
      within(ctx.storage.check(), 2_500, false),
      within(ctx.mailer.check(), 2_500, false),
    ]);
    const word = (ok: boolean): 'ok' | 'down' => (ok ? 'ok' : 'down');
    res.status(db ? 200 : 503).json({ status: db && storage && mail ? 'ok' : 'degraded', db: word(db), storage: word(storage), mail: word(mail) });
  });
  return r;
}
