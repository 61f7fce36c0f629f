import { Jimp } from 'jimp';
import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';
import { getJson, jarsOnAShelf, post } from './support/shelf-jars';

const browser = useBrowser();

interface Story {
  events: { type: string }[];
  incidents: { id: number; voided: boolean }[];
  photos: { source: string }[];
}
const story = (page: Page, id: number) => getJson<Story>(page, `/api/jars/${id}`);

const jpeg = () => new Jimp({ width: 640, height: 480, color: 0x3d8b4aff }).getBuffer('image/jpeg');

/** Signed in, with the service worker in control and the reads the shelf needs cached once. */
async function phoneWithWorker(): Promise<{ context: BrowserContext; page: Page }> {
  const { context, page } = await newPage(browser(), phone);
  await signIn(page, 'technician');
  await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null);
  return { context, page };
}

async function startWalk(page: Page, room: string, shelf: string) {
  await page.goto(`/jars/shelf-walk?room=${encodeURIComponent(room)}&shelf=${encodeURIComponent(shelf)}`);
  await page.getByRole('button', { name: 'Start the walk' }).click();
  await page.getByText(/^1 of \d+$/).waitFor();
}

async function markThree(page: Page, jars: { label: string }[]) {
  for (const [i, mark] of (['Clean', 'Colonised', 'Shaken'] as const).entries()) {
    await page.getByRole('link', { name: jars[i]!.label }).waitFor();
    await page.getByRole('button', { name: mark, exact: true }).click();
  }
}

async function flagWithPhoto(page: Page) {
  await page.getByRole('heading', { name: 'Flag a jar' }).waitFor();
  await page.getByText('Green mould', { exact: true }).click();
  await page
    .locator('input[type=file]')
    .setInputFiles({ name: 'shelf.jpg', mimeType: 'image/jpeg', buffer: await jpeg() });
  await page.getByRole('img', { name: 'shelf.jpg' }).waitFor();
  await page.getByRole('button', { name: 'Flag jar' }).click();
}

describe('at the shelf without signal', () => {
  it('keeps a flag with its photo and three marks through a reload, and sends each once when online', async () => {
    const { context, page } = await phoneWithWorker();
    const { jars, room, shelf } = await jarsOnAShelf(page, 4);
    await startWalk(page, room, shelf);

    await context.setOffline(true);
    await markThree(page, jars);
    await page.getByRole('button', { name: 'Flag', exact: true }).click();
    await flagWithPhoto(page);
    await page.getByText('1 flag and 3 marks waiting to send').waitFor();
    await page.screenshot({ path: `${shotsDir}/walk-offline-phone.png`, fullPage: true });

    await page.reload();
    await page.getByText('1 flag and 3 marks waiting to send').waitFor();
    await page.goto('/outbox');
    await page.getByRole('list', { name: 'Queue' }).waitFor();
    await page.screenshot({ path: `${shotsDir}/outbox-phone.png`, fullPage: true });

    await context.setOffline(false);
    await page.getByText('Nothing waiting: everything has reached the server.').waitFor();
    const flagged = await story(page, jars[3]!.id);
    expect(flagged.incidents).toHaveLength(1);
    expect(flagged.photos.filter((p) => p.source === 'incident')).toHaveLength(1);
    for (const [i, type] of ['check', 'colonised', 'shaken'].entries()) {
      expect((await story(page, jars[i]!.id)).events.map((e) => e.type)).toEqual([type]);
    }
    await context.close();
  });

  it('makes one incident when the answer to the first send is lost on the way back', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'technician');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const { jars } = await jarsOnAShelf(page, 1);
    let posts = 0;
    // The first request reaches the server and is written; the phone never hears the answer.
    await page.route('**/api/incidents', async (route) => {
      if (route.request().method() !== 'POST') return route.continue();
      posts += 1;
      if (posts > 1) return route.continue();
      await route.fetch();
      await route.abort('connectionreset');
    });
    await page.goto(`/incidents/new?jar=${encodeURIComponent(jars[0]!.label)}`);
    await flagWithPhoto(page);
    // The outbox sends again under the same key and gets the first answer: the incident page opens.
    await page.waitForURL(/\/incidents\/\d+$/);
    expect(posts).toBe(2);
    const flagged = await story(page, jars[0]!.id);
    expect(flagged.incidents).toHaveLength(1);
    expect(flagged.photos.filter((p) => p.source === 'incident')).toHaveLength(1);
    await context.close();
  });
});

describe('shelf walk and flag form on a phone', () => {
  it('resumes a walk after leaving it, and undo takes back the last mark', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'technician');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const { jars, room, shelf } = await jarsOnAShelf(page, 3);
    await startWalk(page, room, shelf);
    await page.getByRole('button', { name: 'Clean', exact: true }).click();
    await page.getByRole('button', { name: 'Colonised', exact: true }).click();
    await page.getByText('2 marked · all saved').waitFor();

    await page.getByRole('navigation', { name: 'Main' }).first().getByRole('link').first().click();
    await page.goto('/jars/shelf-walk');
    await page.getByText('3 of 3', { exact: true }).waitFor();
    await page.getByText('2 marked · all saved').waitFor();
    await page.screenshot({ path: `${shotsDir}/walk-resumed-phone.png`, fullPage: true });

    await page.getByRole('button', { name: `Undo ${jars[1]!.label} (colonised)` }).click();
    await page.getByText('2 of 3', { exact: true }).waitFor();
    await page.getByText('1 marked · all saved').waitFor();
    await page.getByRole('link', { name: 'Waiting to send' }).count();
    await expect.poll(async () => (await story(page, jars[1]!.id)).events.length).toBe(0);
    const jar = await getJson<{ jar: { status: string } }>(page, `/api/jars/${jars[1]!.id}`);
    expect(jar.jar.status).toBe('incubating');
    expect((await story(page, jars[0]!.id)).events.map((e) => e.type)).toEqual(['check']);
    await context.close();
  });

  it('blocks "Flag jar" while a refused photo is attached, and warns about an open incident', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'technician');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const { jars } = await jarsOnAShelf(page, 1);
    const label = jars[0]!.label;
    await page.goto(`/incidents/new?jar=${encodeURIComponent(label)}`);
    await page.getByText('Green mould', { exact: true }).click();
    await page
      .locator('input[type=file]')
      .setInputFiles({ name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('not a photo at all') });
    await page.getByText('is not a JPEG, PNG or WebP image').waitFor();
    expect(await page.getByRole('button', { name: 'Flag jar' }).isDisabled()).toBe(true);
    await page.screenshot({ path: `${shotsDir}/flag-refused-photo-phone.png`, fullPage: true });
    await page.getByRole('button', { name: 'Remove' }).click();
    expect(await page.getByRole('button', { name: 'Flag jar' }).isEnabled()).toBe(true);

    await post(page, '/api/incidents', {
      jarLabels: [label],
      contaminant: 'bacterial',
      severity: 'low',
      stage: 'incubation',
      sealed: true,
      sterilisedBeforeDisposal: false,
    });
    await page.goto(`/incidents/new?jar=${encodeURIComponent(label)}`);
    await page.getByText(`${label} already has an open incident`).waitFor();
    await page.screenshot({ path: `${shotsDir}/flag-open-incident-phone.png`, fullPage: true });
    await context.close();
  });
});
