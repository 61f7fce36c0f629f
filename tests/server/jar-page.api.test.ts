import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import supertest from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import type { JarPageReadsDto } from '../../shared/schemas/page-reads';
import { dataSource } from '../../server/db/data-source';
import { signedIn } from '../setup/factories';
import { createTestApp } from '../setup/test-app';
import { jarFixtures, makeJars } from './jars.fixtures';

// A built client in miniature: the page the server fills in for a jar's QR address.
const dir = mkdtempSync(path.join(tmpdir(), 'asepta-jar-page-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
writeFileSync(path.join(dir, 'index.html'), '<!doctype html><html><head><title>t</title></head><body></body></html>');
const app = createTestApp({ staticDir: dir });

const dataOpen = '<script type="application/json" id="page-reads">';

/** The page's reads as the browser will read them: the text up to the first closing tag, parsed. */
function readsIn(html: string): JarPageReadsDto | undefined {
  const start = html.indexOf(dataOpen);
  if (start < 0) return undefined;
  const text = html.slice(start + dataOpen.length, html.indexOf('</script>', start));
  return JSON.parse(text) as JarPageReadsDto;
}

const preloads = (html: string) =>
  [...html.matchAll(/<link rel="preload" as="fetch"[^>]* href="([^"]*)"/g)].map((m) => m[1]);

async function oneJar(client: Awaited<ReturnType<typeof signedIn>>) {
  const [jar] = await makeJars(client, {
    sessionId: (await jarFixtures.session()).id,
    count: 1,
    grainId: await jarFixtures.grainId(),
    cultureId: (await jarFixtures.culture()).id,
    inoculatedAt: '2026-05-04T10:30:00Z',
  });
  return jar!;
}

describe('GET /j/:label, the page a jar QR code opens', () => {
  it('sends a signed-out visitor the plain page with the reads announced as preloads', async () => {
    const res = await supertest(app).get('/j/J00001');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-cache');
    expect(readsIn(res.text)).toBeUndefined();
    expect(preloads(res.text)).toEqual(['/api/jars/by-label/J00001', '/api/auth/me', '/api/settings']);
  });

  it('writes a signed-in person the same three answers the API gives, kept by their browser only', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await oneJar(tech);
    const res = await tech.agent.get(`/j/${jar.label}`);
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('private, no-cache');
    expect(preloads(res.text)).toEqual([]);
    const [me, settings, story] = await Promise.all(
      ['/api/auth/me', '/api/settings', `/api/jars/by-label/${jar.label}`].map(
        async (url) => (await tech.agent.get(url).expect(200)).body as unknown,
      ),
    );
    expect(readsIn(res.text)).toEqual({ me, settings, jar: { label: jar.label, story } });
  });

  it('leaves the jar out for an unknown label, and announces its read so the page can say so', async () => {
    const tech = await signedIn(app, 'technician');
    const res = await tech.agent.get('/j/NO-SUCH-JAR-9');
    expect(res.status).toBe(200);
    const reads = readsIn(res.text);
    expect(reads?.me.username).toBe(tech.user.username);
    expect(reads?.settings).toMatchObject({ timeZone: expect.any(String) as string });
    expect(reads?.jar).toBeUndefined();
    expect(preloads(res.text)).toEqual(['/api/jars/by-label/NO-SUCH-JAR-9']);
  });

  it('keeps a label with markup in it as data: the reads end where they should and read back unchanged', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await oneJar(tech);
    const label = `</script><!--<b>&"'\u2028${jar.id}`;
    await dataSource.query('UPDATE jars SET label = ? WHERE id = ?', [label, jar.id]);
    const res = await tech.agent.get(`/j/${encodeURIComponent(label)}`);
    expect(res.status).toBe(200);
    const reads = readsIn(res.text);
    expect(reads?.jar?.label).toBe(label);
    expect(reads?.jar?.story.jar.label).toBe(label);
    // One opening and one closing script tag: the label's own markup never reaches the HTML as markup.
    expect(res.text.match(/<script/g)).toHaveLength(1);
    expect(res.text.match(/<\/script>/g)).toHaveLength(1);
    expect(res.text).not.toContain('<!--<b>');
  });

  it('escapes an unknown label with markup in the preload it announces', async () => {
    const tech = await signedIn(app, 'technician');
    const res = await tech.agent.get(`/j/${encodeURIComponent('"><img src=x>')}`);
    expect(res.status).toBe(200);
    expect(res.text).not.toContain('<img');
    expect(preloads(res.text)).toEqual([`/api/jars/by-label/${encodeURIComponent('"><img src=x>')}`]);
    expect(readsIn(res.text)?.jar).toBeUndefined();
  });
});
