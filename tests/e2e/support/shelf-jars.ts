import type { Page } from 'playwright-core';

let counter = 0;
export const stamp = () => `${Date.now().toString(36).toUpperCase()}${(counter += 1)}`;

export async function post<T>(page: Page, url: string, data: unknown): Promise<T> {
  const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
  const res = await page.request.post(url, { headers: { 'X-CSRF-Token': token }, data });
  if (!res.ok()) throw new Error(`${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

export async function getJson<T>(page: Page, url: string): Promise<T> {
  const res = await page.request.get(url);
  if (!res.ok()) throw new Error(`${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Invented jars on a shelf of their own, made through the API as the signed-in technician. */
export async function jarsOnAShelf(page: Page, count = 3) {
  const today = new Date().toISOString().slice(0, 10);
  const tag = stamp();
  const session = await post<{ id: number }>(page, '/api/sessions', {
    code: `E2E-S-${tag}`,
    heldOn: today,
    operatorName: 'E2E operator',
    workspace: 'flow-hood',
  });
  const culture = await post<{ id: number }>(page, '/api/cultures', { code: `E2E-LC-${tag}` });
  const grains = await getJson<{ id: number; name: string }[]>(page, '/api/grains');
  const shelf = `E2E-${tag}`;
  const batch = await post<{ jars: { id: number; label: string }[] }>(page, '/api/jars/batch', {
    sessionId: session.id,
    count,
    grainId: grains.find((g) => g.name === 'rye')!.id,
    cultureId: culture.id,
    room: 'E2E room',
    shelf,
  });
  return { jars: batch.jars, room: 'E2E room', shelf };
}
