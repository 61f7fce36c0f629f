import { createRequire } from 'node:module';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { appUrl, phone, shotsDir, signIn, useBrowser } from './support/browser';

// axe-core (Deque, the open accessibility rules engine) checks each page against WCAG 2.x A/AA and its
// best practices; a serious or critical finding fails the test.
const axePath = createRequire(import.meta.url).resolve('axe-core/axe.min.js');
const browser = useBrowser();
const wide = { width: 1366, height: 900 };

/** axe is injected as a script tag; the app's CSP rightly refuses inline scripts, so this context bypasses it. */
async function newPage(viewport: { width: number; height: number }) {
  const context = await browser().newContext({ viewport, baseURL: appUrl(), bypassCSP: true });
  return { context, page: await context.newPage() };
}

interface Finding {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[]; failureSummary?: string }[];
}

/** The page has settled: requests done, no loading status left on screen. */
async function settled(page: Page) {
  await page.waitForLoadState('networkidle');
  await page.waitForFunction(() => !document.querySelector('[role="status"] .animate-spin, [aria-busy="true"]'));
}

async function audit(page: Page, where: string): Promise<string[]> {
  await settled(page);
  if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ path: axePath });
  const findings = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (c: Document, o: object) => Promise<{ violations: unknown }> } })
      .axe;
    return (await axe.run(document, { resultTypes: ['violations'] })).violations;
  });
  return (findings as Finding[])
    .filter((f) => f.impact === 'serious' || f.impact === 'critical')
    .map(
      (f) =>
        `${where} — ${f.impact}: ${f.id} (${f.help})\n` +
        f.nodes
          .slice(0, 5)
          .map((n) => `    at ${n.target.join(' ')}: ${(n.failureSummary ?? '').replace(/\s+/g, ' ')}`)
          .join('\n'),
    );
}

/** One page per kind of address ("/incidents/12" and "/incidents/40" are one kind), so each screen is seen once. */
const kind = (href: string) => {
  const url = new URL(href, 'http://x');
  return url.pathname.replace(/\/j\/[^/]+$/, '/j/:label').replace(/\/\d+(?=\/|$)/g, '/:id');
};
const skipped = /^\/(api|sign-in)|\.(csv|png|jpe?g|webp)$|^\/jars\/labels/;

/** Same-origin links on the page, as paths with their query. */
async function links(page: Page, scope = 'a[href]'): Promise<string[]> {
  const hrefs = await page.$$eval(scope, (as) => as.map((a) => (a as HTMLAnchorElement).href));
  return hrefs
    .map((h) => new URL(h))
    .filter((u) => u.origin === new URL(page.url()).origin && !skipped.test(u.pathname))
    .map((u) => `${u.pathname}${u.search}`);
}

/**
 * Every screen a role reaches: its navigation, then one page of each kind linked from those (a detail page
 * of each register, the analysis tabs, the forms), two levels deep.
 */
async function crawl(
  page: Page,
  role: string,
  extra: string[],
  shared: Set<string>,
): Promise<{ visited: string[]; findings: string[] }> {
  await page.goto('/');
  await settled(page);
  const queue = [...new Set(['/', ...(await links(page, 'nav a[href]')), ...extra])].map((p) => ({ p, depth: 0 }));
  const seen = new Set<string>();
  const visited: string[] = [];
  const findings: string[] = [];
  while (queue.length) {
    const { p, depth } = queue.shift()!;
    // Each kind of screen is checked once, by the first role that reaches it (roles see the same screens with
    // a few buttons more or less); only the home screen, which differs by role, is checked for every role.
    if (seen.has(kind(p)) || (p !== '/' && shared.has(kind(p)))) continue;
    seen.add(kind(p));
    shared.add(kind(p));
    await page.goto(p);
    const found = await audit(page, `${role} ${p}`);
    if (found.length) console.log(found.join('\n'));
    findings.push(...found);
    visited.push(p);
    if (depth < 2) for (const next of await links(page, 'main a[href]')) queue.push({ p: next, depth: depth + 1 });
  }
  console.log(`${role}: ${visited.length} pages: ${visited.join(' ')}`);
  return { visited, findings };
}

const forms: Record<string, string[]> = {
  technician: ['/incidents/new', '/jars/new', '/jars/shelf-walk', '/scan', '/outbox', '/account/mail'],
  supervisor: ['/incidents/new', '/actions?state=open', '/analysis/jars?factor=grain&level=rye'],
  trainer: ['/training', '/account'],
  admin: ['/users', '/settings', '/imports/history'],
};

describe('accessibility', () => {
  // Screens already checked, across the roles' tests, which run one after another in this file.
  const shared = new Set<string>();

  it.each(['technician', 'supervisor', 'trainer', 'admin'])(
    'finds no serious or critical axe finding on any screen the %s reaches on a desktop',
    async (role) => {
      const { context, page } = await newPage(wide);
      await signIn(page, role);
      await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
      const result = await crawl(page, role, forms[role] ?? [], shared);
      await context.close();
      // The home screen is each role's own; the crawl itself proves the other screens were reached.
      expect(result.visited).toContain('/');
      // Joined, so a failure prints every finding readably.
      expect(result.findings.join('\n\n')).toBe('');
    },
    600_000,
  );

  it('finds no serious or critical axe finding on the shelf screens on a phone', async () => {
    const { context, page } = await newPage(phone);
    await signIn(page, 'technician');
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    const jar = await page.evaluate(async () => {
      const r = await fetch('/api/jars?status=incubating&pageSize=1');
      return ((await r.json()) as { items: { label: string }[] }).items[0]!.label;
    });
    const findings: string[] = [];
    for (const p of ['/', '/jars/shelf-walk', `/j/${encodeURIComponent(jar)}`, '/incidents/new', '/scan', '/outbox']) {
      await page.goto(p);
      findings.push(...(await audit(page, `technician on a phone ${p}`)));
    }
    await context.close();
    expect(findings.join('\n\n')).toBe('');
  }, 600_000);

  it('fits the supervisor’s weekly table in 1366 px without sideways scrolling, and lets a phone scroll it in a focusable region', async () => {
    const { context, page } = await newPage(wide);
    await signIn(page, 'supervisor');
    await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    for (const p of ['/', '/analysis/weekly']) {
      await page.goto(p);
      await settled(page);
      await page.locator('table').first().waitFor();
      const width = await page.evaluate(() => ({
        scroll: document.documentElement.scrollWidth,
        inner: window.innerWidth,
      }));
      expect(width.scroll, `${p} at 1366 px`).toBeLessThanOrEqual(width.inner);
      // Readable means whole: the table fits its own box too, no column hidden behind a scroll.
      const region = page.getByRole('region', { name: 'Contamination per ISO week' });
      const box = await region.evaluate((el) => ({ scroll: el.scrollWidth, client: el.clientWidth }));
      expect(box.scroll, `${p}: the weekly table at 1366 px`).toBeLessThanOrEqual(box.client);
    }
    await page.screenshot({ path: path.join(shotsDir, 'weekly-1366.png'), fullPage: true });
    await page.setViewportSize(phone);
    await page.goto('/analysis/weekly');
    await settled(page);
    const region = page.getByRole('region', { name: 'Contamination per ISO week' });
    expect(await region.getAttribute('tabindex')).toBe('0');
    const page2 = await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth);
    expect(page2).toBe(true);
    await context.close();
  });
});
