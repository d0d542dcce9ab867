import fs from 'node:fs';
import path from 'node:path';
import { toNodeHandler } from 'better-auth/node';
import compression from 'compression';
import express, { type Express } from 'express';
import helmet from 'helmet';
import type { Database } from '@/db/client';
import { CLIENT_IP_HEADER, type Auth } from './auth';
import type { Env } from './env';
import { apiNotFound, errorHandler } from './errors';
import { createMailer, type Mailer } from './mail/mailer';
import { requireSameOrigin, requireSession, requireSiteAdmin } from './middleware/session';
import { accountRouter } from './routes/account';
import { clubCapturesRouter } from './routes/club-captures';
import { clubsRouter } from './routes/clubs';
import { devMailRouter } from './routes/dev-mail';
import { healthRouter } from './routes/health';
import { historyRouter } from './routes/history';
import { rateLimitPerClient } from './middleware/rate-limit';
import { invitationPreviewRouter } from './routes/invitation-preview';
import { calibrationDarksRouter } from './routes/calibration-darks';
import { calibrationFramesRouter, calibrationIntakeRouter } from './routes/calibration-intake';
import { calibrationRecipesRouter } from './routes/calibration-recipes';
import { catalogueSearchRouter } from './routes/catalogue-search';
import { cataloguesRouter } from './routes/catalogues';
import { fitsRouter } from './routes/fits';
import { plansRouter, recipePlanRouter } from './routes/plans';
import { recipeDryRunsRouter, treeDryRunRouter } from './routes/dry-runs';
import { recipesRouter } from './routes/recipes';
import { rigsRouter } from './routes/rigs';
import { sitesRouter } from './routes/sites';
import { targetsRouter } from './routes/targets';
import { recipeTemplateRouter } from './routes/template-origin';
import { templatesRouter } from './routes/templates';
import { tonightRouter } from './routes/tonight';
import { visibilityRouter } from './routes/visibility';

export interface AppDeps {
  env: Env;
  db: Database;
  auth: Auth;
  /** Mail for the app's own routes; by default one to the env's SMTP server. */
  mailer?: Mailer;
}

/** Builds the Express app: better-auth, the JSON API, then the exported web build. */
export function createApp({ env, db, auth, mailer }: AppDeps): Express {
  const mail = mailer ?? createMailer({ host: env.SMTP_HOST, port: env.SMTP_PORT, from: env.MAIL_FROM });
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
    }),
  );

  // gzip for the bundle, JSON and plans; event streams stay unbuffered.
  app.use(compression({ filter: (req, res) => !String(res.getHeader('Content-Type') ?? '').startsWith('text/event-stream') && compression.filter(req, res) }));

  // better-auth reads its own bodies: mount it before express.json(). Its rate limiter keys on
  // the client address that Express resolved (trusting only a proxy on loopback).
  app.all('/api/auth/*splat', (req, _res, next) => {
    req.headers[CLIENT_IP_HEADER] = req.ip ?? 'unknown';
    next();
  }, toNodeHandler(auth));

  const session = requireSession(auth);
  const sameOrigin = requireSameOrigin([new URL(env.BASE_URL).origin]);
  // Intake reads a whole folder's headers in one body: its own, larger limit (after the session check).
  app.use('/api/calibration/intake', session, sameOrigin, calibrationIntakeRouter(db));

  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api/health', healthRouter(db));
  // The e-mailed invitation link is opened signed out: its read-only preview needs no session
  // (limited per client address like better-auth's own routes, counted in PostgreSQL).
  app.use('/api/invitations', rateLimitPerClient(db, { prefix: 'invitation-preview', windowS: 60, max: env.AUTH_RATE_LIMIT }), invitationPreviewRouter(db));

  app.use('/api/sites', session, sameOrigin, sitesRouter(db));
  app.use('/api/rigs', session, sameOrigin, rigsRouter(db));
  app.use('/api/recipes', session, sameOrigin, recipeDryRunsRouter(db), recipePlanRouter(db), recipeTemplateRouter(db), recipesRouter(db));
  app.use('/api/plans', session, sameOrigin, plansRouter(db));
  app.use('/api/dry-runs', session, sameOrigin, treeDryRunRouter(db));
  app.use('/api/targets', session, sameOrigin, targetsRouter(db));
  app.use('/api/clubs/:clubId/templates', session, sameOrigin, templatesRouter(db, mail, env.BASE_URL));
  app.use('/api/clubs/:clubId/captures', session, sameOrigin, clubCapturesRouter(db));
  app.use('/api/clubs', session, sameOrigin, clubsRouter(db));
  app.use('/api/account', session, sameOrigin, accountRouter(db));
  app.use('/api/catalogues', session, sameOrigin, cataloguesRouter(db));
  app.use('/api/catalogue', session, catalogueSearchRouter(db));
  app.use('/api/fits', session, sameOrigin, fitsRouter());
  app.use('/api/calibration', session, sameOrigin, calibrationFramesRouter(db), calibrationDarksRouter(db), calibrationRecipesRouter(db));
  app.use('/api/history', session, sameOrigin, historyRouter(db));
  app.use('/api/tonight', session, tonightRouter(db));
  app.use('/api/visibility', session, visibilityRouter(db));
  if (env.DEV_MAIL_PAGE === 'on') app.use('/api/dev/mail', session, requireSiteAdmin, devMailRouter(db));
  app.use('/api', apiNotFound);

  mountWebBuild(app, path.resolve(env.WEB_DIST));
  app.use(errorHandler);
  return app;
}

/** Serves the Expo web export: hashed assets cached for a year, every other path gets index.html. */
function mountWebBuild(app: Express, dist: string): void {
  const index = path.join(dist, 'index.html');
  if (!fs.existsSync(index)) return;
  app.use(['/_expo', '/assets'], (req, res, next) => {
    res.set('Cache-Control', 'public, max-age=31536000, immutable');
    next();
  });
  app.use(express.static(dist, { index: false, maxAge: 0 }));
  app.get('/{*splat}', (req, res) => {
    if (path.extname(req.path)) {
      res.status(404).type('text/plain').send('Not found');
      return;
    }
    res.set('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}
