import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

interface ManifestChunk {
  file: string;
  name?: string;
  imports?: string[];
  css?: string[];
}

/** The built files a source module needs, its own and those of everything it imports statically. */
function chunkFiles(manifest: Record<string, ManifestChunk>, key: string, seen = new Set<string>()): string[] {
  const chunk = manifest[key];
  if (!chunk || seen.has(key)) return [];
  seen.add(key);
  return [chunk.file, ...(chunk.imports ?? []).flatMap((k) => chunkFiles(manifest, k, seen))];
}

const escapeAttr = (s: string) => s.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');

/**
 * The page a jar's QR code opens, with its screen's code and its three reads announced in the HTML:
 * on a weak signal they then travel with the app's own script instead of one round trip after it.
 */
export function jarPageHtml(staticDir: string): (label: string) => string | undefined {
  const manifestPath = path.join(staticDir, '.vite', 'manifest.json');
  if (!existsSync(manifestPath)) return () => undefined;
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as Record<string, ManifestChunk>;
  const html = readFileSync(path.join(staticDir, 'index.html'), 'utf8');
  // The build gathers the jar page's modules into a chunk named jar-page (vite.config.ts); without that, the route's own.
  const jarChunk = Object.keys(manifest).find((k) => manifest[k]?.name === 'jar-page') ?? 'src/app/routes/jar.tsx';
  const modules = chunkFiles(manifest, jarChunk)
    .map((f) => `<link rel="modulepreload" crossorigin href="/${f}">`)
    .join('');
  return (label) => {
    const api = `/api/jars/by-label/${encodeURIComponent(label)}`;
    const reads = [api, '/api/auth/me', '/api/settings']
      .map((href) => `<link rel="preload" as="fetch" crossorigin="anonymous" href="${escapeAttr(href)}">`)
      .join('');
    // The reads go first: a phone opens only six connections, and they are the slowest to answer.
    return html.replace('<head>', `<head>${reads}`).replace('</head>', `${modules}</head>`);
  };
}
