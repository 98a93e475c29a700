import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Config } from '../../config';
import { HttpError } from '../../http-error';

/**
 * Two limits on sign-in: failed attempts per address+account (brute force on one account) and
 * all attempts per address (spraying many accounts). Counters live in process memory: with
 * several API processes each keeps its own, which only loosens the limit by that factor.
 */
export function signInLimits(cfg: Config['signInLimit']): RequestHandler[] {
  const minutes = Math.max(1, Math.ceil(cfg.windowMs / 60_000));
  const wait = minutes === 1 ? 'a minute' : `${minutes} minutes`;
  const refuse = (): HttpError =>
    new HttpError(429, 'rate_limited', `Too many sign-in attempts. Wait ${wait} and try again, or reset your password.`);
  const ip = (req: Parameters<RequestHandler>[0]): string => ipKeyGenerator(req.ip ?? 'unknown');
  return [
    rateLimit({
      windowMs: cfg.windowMs,
      limit: cfg.perAddress,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      keyGenerator: ip,
      handler: (_req, _res, next) => next(refuse()),
    }),
    rateLimit({
      windowMs: cfg.windowMs,
      limit: cfg.perAccount,
      skipSuccessfulRequests: true,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      keyGenerator: (req) => `${ip(req)}|${String((req.body as { email?: unknown })?.email ?? '').trim().toLowerCase()}`,
      handler: (_req, _res, next) => next(refuse()),
    }),
  ];
}
