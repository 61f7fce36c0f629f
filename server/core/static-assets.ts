import path from 'node:path';
import type { Express } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { jarPageHtml } from './page-preloads';

const year = 365 * 24 * 60 * 60;

/**
 * The built client. Vite names every file under assets/ by its content hash, so those never change
 * and are cached for a year; the page, the service worker and the manifest are checked every time
 * so a new version reaches phones at once.
 */
export function serveClient(app: Express, staticDir: string): void {
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
  app.get('/j/:label', (req, res, next) => {
    const html = jarPage(String(req.params.label));
    if (!html) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.type('html').send(html);
  });
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(path.join(staticDir, 'index.html'));
  });
}
