import 'reflect-metadata';
import { existsSync } from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import express, { type Express, type RequestHandler } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { authRouter } from './auth/auth.router';
import { csrfProtection } from './auth/csrf';
import { passport } from './auth/passport';
import { passwordGate } from './auth/password-gate';
import { sessionMiddleware, type SessionStore } from './auth/session';
import { config } from './core/config';
import { AppError } from './core/errors';
import { errorHandler } from './core/error-handler';
import { logger } from './core/logger';
import { serveClient } from './core/static-assets';
import { cookRunsRouter } from './cook-runs/cook-runs.router';
import { culturesRouter } from './cultures/cultures.router';
import { grainLotsRouter, grainsRouter, prepBatchesRouter } from './grain/grain.router';
import { sessionsRouter } from './sessions/sessions.router';
import { healthRouter } from './health/health.router';
import { importsRouter } from './imports/imports.router';
import { jarPageReads } from './jars/jar-page-reads';
import { jarsRouter } from './jars/jars.router';
import { lineageRouter } from './lineage/lineage.router';
import { mailRouter } from './mail/mail.router';
import { proceduresRouter } from './procedures/procedures.router';
import { trainingRouter } from './training/training.router';
import { usersRouter } from './users/users.router';
import { incidentsRouter } from './incidents/incidents.router';
import { correctiveActionsRouter } from './incidents/corrective-actions.router';
import { queueRouter } from './queue/queue.router';
import { photosRouter } from './photos/photos.router';
import { analysisRouter } from './analysis/analysis.router';
import { settingsRouter } from './settings/settings.router';
import { staffRouter } from './staff/staff.router';

export interface AppDeps {
  sessionStore: SessionStore;
  /** The built client; config's STATIC_DIR unless given. */
  staticDir?: string;
}

/** Builds the app without listening: tests drive it with supertest, main.ts serves it. */
export function createApp({ sessionStore, staticDir = config().STATIC_DIR }: AppDeps): Express {
  const c = config();
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', c.TRUST_PROXY ? 1 : false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          // The scanner's QR reader is WebAssembly; this allows compiling it, not eval().
          'script-src': ["'self'", "'wasm-unsafe-eval'"],
          'upgrade-insecure-requests': null,
        },
      },
      // HSTS on a plain-HTTP loopback address would pin browsers to HTTPS that is not there.
      strictTransportSecurity: c.publicUrl.startsWith('https:'),
    }),
  );
  // Scripts and JSON shrink to about a third; a weak signal in an incubation room feels every kilobyte.
  app.use(compression());
  if (c.NODE_ENV !== 'test') app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));

  app.use('/api/health', healthRouter);

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  const session = sessionMiddleware(sessionStore);
  api.use(session);
  // CSRF before authentication: a forged request is refused before anyone's session is looked at.
  api.use(csrfProtection);
  // passport's typings return `any`; the same two handlers also read the session for the jar page.
  const signedIn: RequestHandler[] = [passport.initialize() as RequestHandler, passport.session() as RequestHandler];
  api.use(signedIn);
  api.use(passwordGate);
  api.use('/auth', authRouter);
  api.use('/users', usersRouter);
  api.use('/staff', staffRouter);
  api.use('/grains', grainsRouter);
  api.use('/grain-lots', grainLotsRouter);
  api.use('/prep-batches', prepBatchesRouter);
  api.use('/cook-runs', cookRunsRouter);
  api.use('/cultures', culturesRouter);
  api.use('/sessions', sessionsRouter);
  api.use('/analysis', analysisRouter);
  api.use('/settings', settingsRouter);
  api.use('/jars', jarsRouter);
  api.use('/lineage', lineageRouter);
  api.use('/incidents', incidentsRouter);
  api.use('/corrective-actions', correctiveActionsRouter);
  api.use('/queue', queueRouter);
  api.use('/photos', photosRouter);
  api.use('/imports', importsRouter);
  api.use(proceduresRouter);
  api.use(trainingRouter);
  api.use('/mail', mailRouter);
  api.use((req, _res, next) => next(new AppError(404, 'not-found', `No API route ${req.method} ${req.path}.`)));
  app.use('/api', api);

  const clientDir = path.resolve(staticDir);
  if (existsSync(path.join(clientDir, 'index.html')))
    serveClient(app, clientDir, { session: [session, ...signedIn], jar: jarPageReads });
  app.use(errorHandler);
  return app;
}
