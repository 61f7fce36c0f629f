/**
 * npm run measure:shelf (after `vite build`): the built app over a throwaway MariaDB with the demo lab,
 * driven in Chromium at 390 × 844. Prints the load time of a jar page cold under DevTools' "Fast 3G"
 * (CDP Network.emulateNetworkConditions), warm from the service worker, and offline; then the taps,
 * scrolls and time from opening /j/<label> to the flag's confirmation. COLD_RUNS (default 3) cold loads, each in
 * a fresh context; the first prints its requests' timeline. Prints figures; asserts nothing.
 */
import 'reflect-metadata';
import { Jimp } from 'jimp';
import { chromium, type BrowserContext, type Locator, type Page } from 'playwright-core';
import { freePort } from './free-port';
import { applyTestEnv } from '../tests/setup/test-env';
import { startThrowawayDb } from '../tests/setup/throwaway-db';

// Chrome DevTools' "Fast 3G" preset: 562.5 ms latency, 1.6 Mbps down and 750 kbps up, each × 0.9.
const fast3g = { offline: false, latency: 562.5, downloadThroughput: 180_000, uploadThroughput: 84_375 };
const open = { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 };
const phone = { width: 390, height: 844 };
const log = (line: string) => process.stdout.write(`${line}\n`);

const db = await startThrowawayDb('asepta_measure');
const port = await freePort();
applyTestEnv(db.port, 'asepta_measure', { PORT: String(port), PUBLIC_URL: `http://127.0.0.1:${port}` });
const { dataSource } = await import('../server/db/data-source');
const { startServer } = await import('../server/main');
const { loadDemoLab } = await import('../server/demo-lab/demo-lab');
await dataSource.initialize();
await dataSource.runMigrations({ transaction: 'each' });
await loadDemoLab(() => undefined);
const server = await startServer({ migrate: false, digest: false });
const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/lib/chromium/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run'],
});

async function signedIn(): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: phone, baseURL: server.url });
  const page = await context.newPage();
  const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
  await page.request.post('/api/auth/login', {
    headers: { 'X-CSRF-Token': token },
    data: { username: 'technician', password: 'asepta-demo' },
  });
  return { context, page };
}

async function incubatingLabels(page: Page, n: number): Promise<string[]> {
  const res = await page.request.get(`/api/jars?status=incubating&pageSize=${n}`);
  return ((await res.json()) as { items: { label: string }[] }).items.map((j) => j.label);
}

/** Navigation start to the jar's heading in the page, and the bytes that crossed the network. */
async function loadJar(page: Page, label: string, counter: { bytes: number }) {
  counter.bytes = 0;
  const started = performance.now();
  await page.goto(`/j/${encodeURIComponent(label)}`, { waitUntil: 'commit' });
  // Checked on every frame: a locator's own wait looks only every half second, which would round the figure up.
  await page.waitForFunction((l) => [...document.querySelectorAll('h1')].some((h) => h.textContent === l), label, {
    polling: 'raf',
  });
  const ms = Math.round(performance.now() - started);
  await page.getByRole('heading', { name: label }).waitFor();
  return { ms, kB: Math.round(counter.bytes / 1024) };
}

interface Request {
  url: string;
  start: number;
  end?: number;
  bytes?: number;
}

/** Each request of a load, from its start to its last byte, in seconds since the first one. */
function printTimeline(requests: Map<string, Request>) {
  const all = [...requests.values()];
  const t0 = Math.min(...all.map((r) => r.start));
  for (const r of all.sort((a, b) => a.start - b.start)) {
    const path = new URL(r.url).pathname;
    const end = r.end === undefined ? '   …' : (r.end - t0).toFixed(2);
    log(
      `  ${(r.start - t0).toFixed(2)} → ${end} s  ${String(Math.round((r.bytes ?? 0) / 1024)).padStart(4)} kB  ${path}`,
    );
  }
}

declare global {
  interface Window {
    jarHeadingAt?: number;
  }
}

/**
 * The moment, inside the page, that the jar's heading is added and the frame after it is drawn. Playwright
 * looks for the heading only every half second, so its figure can be late by up to that much.
 */
function watchHeading(label: string) {
  // Plain expressions only: tsx wraps named inner functions in a helper the page does not have.
  new MutationObserver((_, observer) => {
    if (![...document.querySelectorAll('h1')].some((h) => h.textContent === label)) return;
    observer.disconnect();
    requestAnimationFrame(() => (window.jarHeadingAt = performance.now()));
  }).observe(document, { childList: true, subtree: true, characterData: true });
}

/** Times since navigation start that the page itself saw: HTML, entry script, first paint, heading drawn. */
async function pageMarks(page: Page) {
  const [html, script, paint, heading] = await page.evaluate(() =>
    [
      (performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming | undefined)?.responseEnd,
      (performance.getEntriesByType('resource') as PerformanceResourceTiming[]).find((r) =>
        /\/assets\/index-[^/]+\.js$/.test(r.name),
      )?.responseEnd,
      performance.getEntriesByName('first-contentful-paint')[0]?.startTime,
      window.jarHeadingAt,
    ].map((t) => (t === undefined ? NaN : Math.round(t))),
  );
  return { html: html ?? NaN, script: script ?? NaN, paint: paint ?? NaN, heading: heading ?? NaN };
}

/** A cold load in a fresh context (empty cache, no service worker), with its request timeline. */
async function coldLoad(label: string, timeline: boolean) {
  const { context, page } = await signedIn();
  await page.addInitScript(watchHeading, label);
  const cdp = await context.newCDPSession(page);
  const counter = { bytes: 0 };
  const requests = new Map<string, Request>();
  cdp.on('Network.requestWillBeSent', (e: { requestId: string; timestamp: number; request: { url: string } }) =>
    requests.set(e.requestId, { url: e.request.url, start: e.timestamp }),
  );
  cdp.on('Network.loadingFinished', (e: { requestId: string; timestamp: number; encodedDataLength: number }) => {
    counter.bytes += e.encodedDataLength;
    const r = requests.get(e.requestId);
    if (r) Object.assign(r, { end: e.timestamp, bytes: e.encodedDataLength });
  });
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', fast3g);
  const cold = await loadJar(page, label, counter);
  log(`cold /j/<label>, Fast 3G, empty cache:       ${cold.ms} ms, ${cold.kB} kB over the network`);
  const marks = await pageMarks(page);
  log(
    `  in the page: HTML ${marks.html} ms, entry script ${marks.script} ms, first paint ${marks.paint} ms, heading drawn ${marks.heading} ms`,
  );
  if (timeline) printTimeline(requests);
  await context.close();
  return { seen: cold.ms, drawn: marks.heading };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];

const coldRuns = Number(process.env.COLD_RUNS ?? 3);

try {
  const { context, page } = await signedIn();
  const [first, second] = await incubatingLabels(page, 2);
  const colds = [];
  for (let i = 0; i < coldRuns; i += 1) colds.push(await coldLoad(first!, i === 0));
  log(
    `cold median of ${coldRuns}: ${median(colds.map((c) => c.seen))} ms seen by the script, heading drawn at ${median(colds.map((c) => c.drawn))} ms`,
  );
  const cdp = await context.newCDPSession(page);
  const counter = { bytes: 0 };
  cdp.on('Network.loadingFinished', (e: { encodedDataLength: number }) => (counter.bytes += e.encodedDataLength));
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', fast3g);
  // The first visit of this context installs the service worker that the warm and offline loads use.
  await loadJar(page, first!, counter);

  await cdp.send('Network.emulateNetworkConditions', open);
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 60_000 });
  await loadJar(page, first!, counter);
  await cdp.send('Network.emulateNetworkConditions', fast3g);
  const warm = await loadJar(page, first!, counter);
  log(`warm /j/<label>, Fast 3G, service worker:     ${warm.ms} ms, ${warm.kB} kB over the network`);
  await context.setOffline(true);
  const offline = await loadJar(page, first!, counter);
  log(`offline /j/<label>, service worker:           ${offline.ms} ms`);
  await context.setOffline(false);
  await cdp.send('Network.emulateNetworkConditions', open);

  // The flag flow as a technician does it; a tap on something below the fold would need a scroll first.
  let taps = 0;
  let scrolls = 0;
  const tap = async (target: Locator) => {
    const box = await target.boundingBox();
    if (!box || box.y + box.height > phone.height) scrolls += 1;
    taps += 1;
  };
  const photo = await new Jimp({ width: 1600, height: 1200, color: 0x3d8b4aff }).getBuffer('image/jpeg');
  const started = performance.now();
  await page.goto(`/j/${encodeURIComponent(second!)}`);
  const flagLink = page.getByRole('link', { name: 'Flag contamination' });
  await tap(flagLink);
  await flagLink.click();
  const tile = page.getByText('Green mould', { exact: true });
  await tap(tile);
  await tile.click();
  await tap(page.getByText('Take a photo'));
  await page.locator('input[type=file]').setInputFiles({ name: 'jar.jpg', mimeType: 'image/jpeg', buffer: photo });
  await page.getByRole('img', { name: 'jar.jpg' }).waitFor();
  const send = page.getByRole('button', { name: 'Flag jar' });
  await tap(send);
  await send.click();
  await page.waitForURL(/\/incidents\/\d+$/);
  await page.getByRole('heading', { name: /^Incident \d+$/ }).waitFor();
  const flowMs = Math.round(performance.now() - started);
  log(
    `/j/<label> → confirmation (scripted, open network): ${flowMs} ms, ${taps} taps plus the camera, ${scrolls} scrolls`,
  );
  await context.close();
} finally {
  await browser.close();
  await server.close();
  await db.stop();
}
