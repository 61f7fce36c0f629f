/**
 * Register pages for the bench, through the real HTTP routes: page 1 and a deep page with each list's
 * default sort, and a label or code prefix search where the list has one; then a number of users at
 * once on the jar register and the weekly table. Prints figures; asserts nothing.
 */
import { median, percentile, type Table } from './bench-table';

export type Get = (url: string, cookie?: string) => Promise<{ size: number; body: string }>;

interface Register {
  name: string;
  url: string;
  /** A prefix search as a reader would type it, or null where the list has none. */
  search: string | null;
}

const registers: Register[] = [
  { name: 'jars', url: '/api/jars', search: 'q=BJ-00012' },
  { name: 'incidents', url: '/api/incidents', search: 'jar=BJ-00012' },
  { name: 'cook runs', url: '/api/cook-runs', search: 'q=BCR-0001' },
  { name: 'cultures', url: '/api/cultures', search: 'q=BLC-01' },
  { name: 'sessions', url: '/api/sessions', search: 'q=BS-0001' },
  { name: 'grain lots', url: '/api/grain-lots', search: 'q=BGL-001' },
  { name: 'prep batches', url: '/api/prep-batches', search: 'q=BPB-001' },
  { name: 'training', url: '/api/training-records', search: null },
  { name: 'sent mail', url: '/api/mail/sent', search: 'kind=retraining' },
];

const PAGE_SIZE = 25;
/** Deep enough that an OFFSET over unsorted rows would show, as far as a reader pages by hand. */
const DEEP_PAGE = 400;

async function timed(get: Get, url: string, runs: number): Promise<{ times: number[]; size: number; body: string }> {
  const times: number[] = [];
  let last = { size: 0, body: '' };
  for (let i = 0; i < runs + 2; i++) {
    const t0 = performance.now();
    last = await get(url);
    // The first two runs warm caches.
    if (i >= 2) times.push(performance.now() - t0);
  }
  return { times, ...last };
}

export async function benchRegisters(get: Get, runs: number): Promise<Table> {
  const rows: string[][] = [];
  for (const r of registers) {
    const first = await timed(get, `${r.url}?page=1&pageSize=${PAGE_SIZE}`, runs);
    const page = JSON.parse(first.body) as { total: number; totalCapped?: boolean };
    const pages = Math.max(1, Math.ceil(page.total / PAGE_SIZE));
    const deep = Math.min(DEEP_PAGE, pages);
    const cases: [string, string | null][] = [
      ['page 1', `${r.url}?page=1&pageSize=${PAGE_SIZE}`],
      ['deep page', deep > 1 ? `${r.url}?page=${deep}&pageSize=${PAGE_SIZE}` : null],
      [
        r.search ? `search ${r.search}` : 'search (none)',
        r.search ? `${r.url}?${r.search}&page=1&pageSize=${PAGE_SIZE}` : null,
      ],
    ];
    for (const [what, url] of cases) {
      if (!url) continue;
      const t = what === 'page 1' ? first : await timed(get, url, runs);
      const own = JSON.parse(t.body) as { total: number; totalCapped?: boolean };
      rows.push([
        `${r.name}: ${what}`,
        what === 'deep page' ? String(deep) : '',
        `${own.total}${own.totalCapped ? '+' : ''}`,
        median(t.times).toFixed(1),
        percentile(t.times, 95).toFixed(1),
        `${(t.size / 1024).toFixed(1)} KiB`,
      ]);
    }
  }
  return { header: ['register page', 'page', 'total', 'median ms', 'p95 ms', 'answer size'], rows };
}

/** `users` signed-in readers each asking `each` times in a row, all at once; every request timed. */
export async function benchConcurrent(
  get: Get,
  cookies: string[],
  each: number,
  cases: { name: string; url: (i: number) => string }[],
): Promise<Table> {
  const rows: string[][] = [];
  for (const c of cases) {
    const times: number[] = [];
    let errors = 0;
    let n = 0;
    const t0 = performance.now();
    await Promise.all(
      cookies.map(async (cookie) => {
        for (let i = 0; i < each; i++) {
          const s = performance.now();
          try {
            await get(c.url(n++), cookie);
            times.push(performance.now() - s);
          } catch {
            errors += 1;
          }
        }
      }),
    );
    const seconds = (performance.now() - t0) / 1000;
    rows.push([
      c.name,
      String(cookies.length),
      String(times.length + errors),
      times.length ? median(times).toFixed(1) : '-',
      times.length ? percentile(times, 97.5).toFixed(1) : '-',
      String(errors),
      ((times.length + errors) / seconds).toFixed(1),
    ]);
  }
  return {
    header: ['at once', 'users', 'requests', 'median ms', 'p97.5 ms', 'errors', 'requests/s'],
    rows,
  };
}
