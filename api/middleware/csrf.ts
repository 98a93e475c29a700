import type { RequestHandler } from 'express';
import { CSRF_HEADER, CSRF_HEADER_VALUE } from '../../shared/api-error';
import { HttpError } from '../http-error';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * CSRF defence for every state-changing request: a custom header that a cross-site form or
 * image cannot send (and a cross-site fetch could send only after a CORS preflight we never
 * grant), plus an Origin check when the browser sends one. The session cookie is also SameSite=Lax.
 */
export function csrfGuard(publicUrl: string): RequestHandler {
  const allowed = new URL(publicUrl).origin;
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    if (req.get(CSRF_HEADER) !== CSRF_HEADER_VALUE) {
      return next(new HttpError(403, 'csrf_failed', `Missing the ${CSRF_HEADER} header; reload the page and try again.`));
    }
    const origin = req.get('origin');
    if (origin && origin !== allowed && origin !== `${req.protocol}://${req.get('host')}`) {
      return next(new HttpError(403, 'csrf_failed', 'Cross-site request refused.'));
    }
    next();
  };
}
