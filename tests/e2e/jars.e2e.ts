import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';

const browser = useBrowser();
let counter = 0;
const stamp = () => `${Date.now().toString(36).toUpperCase()}${(counter += 1)}`;

async function post<T>(page: Page, url: string, data: unknown): Promise<T> {
  const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
  const res = await page.request.post(url, { headers: { 'X-CSRF-Token': token }, data });
  if (!res.ok()) throw new Error(`${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Three invented jars on a shelf of their own, made through the API as the signed-in technician. */
async function threeJarsOnAShelf(page: Page) {
  const today = new Date().toISOString().slice(0, 10);
  const tag = stamp();
  const session = await post<{ id: number }>(page, '/api/sessions', {
    code: `E2E-S-${tag}`,
    heldOn: today,
    operatorName: 'E2E operator',
    workspace: 'flow-hood',
  });
  const culture = await post<{ id: number }>(page, '/api/cultures', { code: `E2E-LC-${tag}` });
  const grains = (await (await page.request.get('/api/grains')).json()) as { id: number; name: string }[];
  const shelf = `E2E-${tag}`;
  const batch = await post<{ jars: { id: number; label: string }[] }>(page, '/api/jars/batch', {
    sessionId: session.id,
    count: 3,
    grainId: grains.find((g) => g.name === 'rye')!.id,
    cultureId: culture.id,
    room: 'E2E room',
    shelf,
  });
  return { jars: batch.jars, shelf };
}

describe('jars on a phone', () => {
  it('opens a jar from its QR address and walks a shelf of three jars', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'technician');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const { jars, shelf } = await threeJarsOnAShelf(page);

    // The address the QR code encodes is the jar's page.
    const story = (await (await page.request.get(`/api/jars/${jars[0]!.id}`)).json()) as { pageUrl: string };
    expect(story.pageUrl).toMatch(new RegExp(`/j/${jars[0]!.label}$`));
    await page.goto(story.pageUrl);
    await page.getByRole('heading', { name: jars[0]!.label }).waitFor();
    expect(await page.getByRole('link', { name: 'Flag contamination' }).isVisible()).toBe(true);
    const check = page.getByRole('button', { name: 'Check', exact: true });
    const box = await check.boundingBox();
    expect(box!.height).toBeGreaterThanOrEqual(44);
    await page.screenshot({ path: `${shotsDir}/jar-page-phone.png`, fullPage: true });

    await page.goto(`/jars/shelf-walk?room=${encodeURIComponent('E2E room')}&shelf=${encodeURIComponent(shelf)}`);
    for (const [i, mark] of (['Clean', 'Colonised', 'Shaken'] as const).entries()) {
      await page.getByText(`${i + 1} of 3`, { exact: true }).waitFor();
      expect(await page.getByRole('link', { name: jars[i]!.label }).isVisible()).toBe(true);
      if (i === 1) await page.screenshot({ path: `${shotsDir}/shelf-walk-jar-phone.png` });
      await page.getByRole('button', { name: mark, exact: true }).click();
    }
    await page.getByRole('button', { name: 'Save 3 marks' }).click();
    await page.getByRole('link', { name: 'See this shelf’s jars' }).waitFor();
    await page.screenshot({ path: `${shotsDir}/shelf-walk-phone.png`, fullPage: true });

    const after = (await (
      await page.request.get(
        `/api/jars?shelf=${encodeURIComponent(shelf)}&room=${encodeURIComponent('E2E room')}&sort=label`,
      )
    ).json()) as {
      items: { label: string; status: string }[];
    };
    expect(after.items.map((j) => j.status)).toEqual(['incubating', 'colonised', 'incubating']);
    const shaken = (await (await page.request.get(`/api/jars/${jars[2]!.id}`)).json()) as {
      events: { type: string }[];
    };
    expect(shaken.events.map((e) => e.type)).toEqual(['shaken']);
    await context.close();
  });

  it('prints a label sheet with a QR image per jar and shows where a jar was used', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'technician');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const { jars } = await threeJarsOnAShelf(page);
    await page.goto(`/jars/labels?ids=${jars.map((j) => j.id).join(',')}&layout=roll`);
    const images = page.getByRole('img', { name: /^QR code for / });
    await images.first().waitFor();
    expect(await images.count()).toBe(3);
    await page.waitForFunction(() => [...document.images].every((img) => img.complete && img.naturalWidth > 0));
    await page.screenshot({ path: `${shotsDir}/labels-roll-phone.png`, fullPage: true });

    await page.goto(`/lineage/jar/${jars[0]!.id}`);
    await page.getByRole('heading', { name: `Where used: jar ${jars[0]!.label}` }).waitFor();
    // A technician sees the tree but not the hold action, which is for supervisors.
    expect(await page.getByRole('button', { name: 'Hold everything unreleased' }).count()).toBe(0);
    await context.close();
  });
});
