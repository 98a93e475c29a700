import { Router } from 'express';
import { HttpError } from '../../http-error';
import { compute, ENGINE_VERSION, QueueError } from '../../../shared/queue/index';
import { COMPUTE_MAX_SPECS } from '../../../shared/schemas/studies';
import type { AppContext } from '../../context';
import { requireRole } from '../../middleware/auth';
import { jsonSafe } from '../studies/json-safe';

/**
 * POST /api/compute: the engine over HTTP, as the CLI takes it. One spec answers its result (or a
 * 422 error body); an array answers an array in the same order with `{ error }` in place of each
 * failure. For previews and integrations; nothing is stored.
 */
export function computeRouter(_ctx: AppContext): Router {
  const r = Router();
  r.post('/compute', requireRole('admin', 'partner', 'consultant'), (req, res) => {
    res.set('X-Engine-Version', ENGINE_VERSION);
    const body: unknown = req.body;
    if (!Array.isArray(body)) {
      res.json(jsonSafe(compute(body)));
      return;
    }
    if (body.length > COMPUTE_MAX_SPECS) {
      throw new HttpError(400, 'validation_failed', `At most ${COMPUTE_MAX_SPECS} specs per request.`, [{ path: '', message: `at most ${COMPUTE_MAX_SPECS} specs` }]);
    }
    res.json(
      body.map((spec) => {
        try {
          return jsonSafe(compute(spec));
        } catch (err) {
          if (err instanceof QueueError) return { error: err.toJSON() };
          throw err;
        }
      }),
    );
  });
  return r;
}
