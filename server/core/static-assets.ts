import path from 'node:path';
import type { Express, RequestHandler } from 'express';
import expressStaticGzip from 'express-static-gzip';
import type { JarPageReadsDto } from '../../shared/schemas/page-reads';
import type { SessionUser } from './auth-guards';
import { logger } from './logger';
import { jarPageHtml } from './page-preloads';

export interface PageReads {
  /** What makes req.user: the session and passport, as on /api. */
  session: RequestHandler[];
  jar: (user: SessionUser, label: string) => Promise<JarPageReadsDto>;
}

const year = 365 * 24 * 60 * 60;

// Without its reads the page still works: it asks the API, which answers with the error itself.
const withoutReads = (error: unknown) => {
  logger.warn({ err: error }, 'jar page sent without its reads');
  return undefined;
};

/** Runs the handlers in turn; one that fails (the session store away) leaves the page signed out, not broken. */
function bestEffort(handlers: RequestHandler[]): RequestHandler {
  return (req, res, next) => {
    const from =
      (i: number) =>
      (error?: unknown): void => {
        const handler = handlers[i];
        if (error) withoutReads(error);
        if (error || !handler) return next();
        void handler(req, res, from(i + 1));
      };
    from(0)();
  };
}

/**
 * The built client. Vite names every file under assets/ by its content hash, so those never change
 * and are cached for a year; the page, the service worker and the manifest are checked every time
 * so a new version reaches phones at once.
 */
export function serveClient(app: Express, staticDir: string, reads?: PageReads): void {
  // The build writes .br and .gz beside each text file; the best one the browser accepts goes out as is.
  app.use(
    expressStaticGzip(staticDir, {
      index: false,
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      serveStatic: {
        index: false,
        setHeaders(res, file) {
          const rel = path
            .relative(staticDir, file)
            .split(path.sep)
            .join('/')
            .replace(/\.(br|gz)$/, '');
          if (rel.startsWith('assets/')) res.setHeader('Cache-Control', `public, max-age=${year}, immutable`);
          else if (rel === 'sw.js' || rel.endsWith('.webmanifest') || rel.endsWith('.html'))
            res.setHeader('Cache-Control', 'no-cache');
          else res.setHeader('Cache-Control', 'public, max-age=86400');
        },
      },
    }),
  );
  const jarPage = jarPageHtml(staticDir);
  app.get('/j/:label', bestEffort(reads?.session ?? []), async (req, res) => {
    const label = String(req.params.label);
    const user = req.user && !req.user.mustChangePassword ? req.user : undefined;
    const data = user && reads ? await reads.jar(user, label).catch(withoutReads) : undefined;
    // The page is the same for everyone until it carries a person's reads; then only their browser keeps it.
    res.setHeader('Cache-Control', data ? 'private, no-cache' : 'no-cache');
    res.type('html').send(jarPage(label, data));
  });
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(path.join(staticDir, 'index.html'));
  });
}
