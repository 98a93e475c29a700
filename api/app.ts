import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import { configurePassport } from './auth/passport-setup';
import type { AppContext } from './context';
import { HttpError } from './http-error';
import { csrfGuard } from './middleware/csrf';
import { errorHandler } from './middleware/error-handler';
import { securityHeaders } from './middleware/security-headers';
import { assumptionsRouter } from './routes/assumptions/assumptions.router';
import { auditRouter } from './routes/audit/audit.router';
import { authRouter } from './routes/auth/auth.router';
import { computeRouter } from './routes/compute/compute.router';
import { datasetsRouter } from './routes/datasets/datasets.router';
import { deliverablesRouter } from './routes/deliverables/deliverables.router';
import { engagementsRouter } from './routes/engagements/engagements.router';
import { healthRouter } from './routes/health/health.router';
import { invitationsRouter } from './routes/invitations/invitations.router';
import { mailboxRouter } from './routes/mailbox/mailbox.router';
import { revisionsRouter } from './routes/revisions/revisions.router';
import { studiesRouter } from './routes/studies/studies.router';
import { simulationsRouter } from './routes/simulations/simulations.router';
import { usersRouter } from './routes/users/users.router';
import { verifyRouter } from './routes/verify/verify.router';

export const SESSION_COOKIE = 'sojourn.sid';

/** Builds the Express app (no listen): API under /api, the built web app for everything else. */
export function createApp(ctx: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  // API answers are no-store, so an ETag (a SHA-1 of every body) would never be used.
  app.set('etag', false);
  if (ctx.config.trustProxy) app.set('trust proxy', 1);
  app.use(
    securityHeaders({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // vega-embed and React set inline style attributes; no inline scripts are allowed.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          formAction: ["'self'"],
          upgradeInsecureRequests: ctx.config.cookieSecure ? [] : null,
        },
      },
    }),
  );

  const api = express.Router();
  // A study document may hold DOCUMENT_MAX_CHARS (2M characters, more bytes in UTF-8): its save
  // gets a larger body limit; every other route keeps 2 MB. The first parser to read a body wins.
  api.put('/studies/:id/document', express.json({ limit: '8mb' }));
  api.use(express.json({ limit: '2mb' }));
  api.use(
    session({
      name: SESSION_COOKIE,
      secret: ctx.config.sessionSecret,
      store: ctx.sessionStore,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: ctx.config.cookieSecure, maxAge: 12 * 3600_000 },
    }),
  );
  const passport = configurePassport(ctx.db, ctx.sessionStore);
  // No passport.initialize(): passport.session() below sets up the same request helpers itself
  // (passport 0.6+), and the compatibility shim it adds is for strategies written for passport 0.4.
  api.use(passport.session());
  api.use(csrfGuard(ctx.config.publicUrl));
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });

  // A request walks the routers in this order until a route matches (no two routers share a
  // method and path), so the editor's constant traffic (compute, study, register) comes first.
  api.use(computeRouter(ctx));
  api.use(studiesRouter(ctx));
  api.use(assumptionsRouter(ctx));
  api.use(authRouter(ctx, passport));
  api.use(healthRouter(ctx));
  api.use(invitationsRouter(ctx));
  api.use(usersRouter(ctx));
  api.use(engagementsRouter(ctx));
  api.use(datasetsRouter(ctx));
  api.use(auditRouter(ctx));
  api.use(mailboxRouter(ctx));
  api.use(simulationsRouter());
  api.use(revisionsRouter(ctx));
  api.use(deliverablesRouter(ctx));
  api.use(verifyRouter(ctx));
  api.use((req) => {
    throw new HttpError(404, 'not_found', `No API route ${req.method} ${req.path}.`);
  });
  app.use('/api', api);

  const dist = ctx.config.webDist;
  if (dist && existsSync(join(dist, 'index.html'))) {
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    // Client-side routes: every non-API GET gets the app shell.
    app.get('/{*splat}', (_req, res) => res.sendFile(join(dist, 'index.html')));
  }
  app.use(errorHandler);
  return app;
}
