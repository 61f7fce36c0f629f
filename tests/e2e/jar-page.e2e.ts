import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { newPage, phone, useBrowser } from './support/browser';

const browser = useBrowser();

/** Signed in through the API only, so the jar page is the first page this browser loads. */
async function signInQuietly(page: Page) {
  const { token } = (await (await page.request.get('/api/auth/csrf')).json()) as { token: string };
  const res = await page.request.post('/api/auth/login', {
    headers: { 'X-CSRF-Token': token },
    data: { username: 'technician', password: 'asepta-demo' },
  });
  expect(res.status()).toBe(200);
}

async function anIncubatingLabel(page: Page) {
  const res = await page.request.get('/api/jars?status=incubating&pageSize=1');
  return ((await res.json()) as { items: { label: string }[] }).items[0]!.label;
}

describe('a jar page opened cold from its QR address', () => {
  it('shows the jar from the reads written into the page, without asking the API for them', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signInQuietly(page);
    const label = await anIncubatingLabel(page);
    const asked: string[] = [];
    page.on('request', (r) => asked.push(new URL(r.url()).pathname));
    await page.goto(`/j/${encodeURIComponent(label)}`);
    await page.getByRole('heading', { name: label }).waitFor();
    expect(await page.getByRole('link', { name: 'Flag contamination' }).isVisible()).toBe(true);
    expect(asked.filter((p) => ['/api/auth/me', '/api/settings', `/api/jars/by-label/${label}`].includes(p))).toEqual(
      [],
    );
    await context.close();
  });

  it('says so when no jar has the label', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signInQuietly(page);
    await page.goto('/j/NOPE-404');
    const heading = page.getByRole('heading', { name: 'No jar is labelled NOPE-404.' });
    await heading.waitFor();
    expect(await heading.isVisible()).toBe(true);
    await context.close();
  });

  it('sends a signed-out visitor to sign in first', async () => {
    const { context, page } = await newPage(browser(), phone);
    await page.goto('/j/J00001');
    await page.getByLabel('Username').waitFor();
    expect(new URL(page.url()).pathname).not.toMatch(/^\/j\//);
    await context.close();
  });
});
