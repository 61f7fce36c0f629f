import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { pageReadsId, type JarPageReadsDto } from '../../shared/schemas/page-reads';

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
 * JSON that stays data inside a <script> element: `<` can never start `</script>` or `<!--`, and the
 * line separators some older parsers end a line on are escaped too. JSON.parse reads it back unchanged.
 */
export const scriptSafeJson = (value: unknown) =>
  JSON.stringify(value).replace(/[<>&\u2028\u2029]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);

/**
 * The page a jar's QR code opens, with its screen's code announced in the HTML. For a signed-in person
 * the server also writes the screen's reads into the page (`reads`); any read it could not write is
 * announced as a preload instead: on a weak signal either way it travels with the app's own script
 * instead of one round trip after it.
 */
export function jarPageHtml(staticDir: string): (label: string, reads?: JarPageReadsDto) => string {
  const html = readFileSync(path.join(staticDir, 'index.html'), 'utf8');
  const manifestPath = path.join(staticDir, '.vite', 'manifest.json');
  const manifest = existsSync(manifestPath)
    ? (JSON.parse(readFileSync(manifestPath, 'utf8')) as Record<string, ManifestChunk>)
    : {};
  // The build gathers the jar page's modules into a chunk named jar-page (vite.config.ts); without that, the route's own.
  const jarChunk = Object.keys(manifest).find((k) => manifest[k]?.name === 'jar-page') ?? 'src/app/routes/jar.tsx';
  const modules = chunkFiles(manifest, jarChunk)
    .map((f) => `<link rel="modulepreload" crossorigin href="/${f}">`)
    .join('');
  return (label, reads) => {
    const fetched = [
      reads?.jar ? undefined : `/api/jars/by-label/${encodeURIComponent(label)}`,
      reads ? undefined : '/api/auth/me',
      reads ? undefined : '/api/settings',
    ].filter((href) => href !== undefined);
    const preloads = fetched
      .map((href) => `<link rel="preload" as="fetch" crossorigin="anonymous" href="${escapeAttr(href)}">`)
      .join('');
    const data = reads ? `<script type="application/json" id="${pageReadsId}">${scriptSafeJson(reads)}</script>` : '';
    // The reads go first: a phone opens only six connections, and they are the slowest to answer.
    return html.replace('<head>', `<head>${preloads}`).replace('</head>', `${modules}${data}</head>`);
  };
}
