import { Jimp } from 'jimp';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { desktop, newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';

const browser = useBrowser();

interface Named {
  id: number;
  code?: string;
  label?: string;
}

async function json<T>(page: Page, url: string): Promise<T> {
  const res = await page.request.get(url);
  expect(res.status()).toBe(200);
  return (await res.json()) as T;
}

/** An incubating jar of the demo lab, or a new one made through the jars API when there is none. */
async function incubatingJar(page: Page): Promise<string> {
  const jars = await json<{ items: Named[] }>(page, '/api/jars?status=incubating&pageSize=1');
  if (jars.items[0]?.label) return jars.items[0].label;
  const [session] = (await json<{ items: Named[] }>(page, '/api/sessions?pageSize=1')).items;
  const [culture] = (await json<{ items: Named[] }>(page, '/api/cultures?pageSize=1')).items;
  const token = (await json<{ token: string }>(page, '/api/auth/csrf')).token;
  const made = await page.request.post('/api/jars', {
    headers: { 'X-CSRF-Token': token },
    data: { sessionId: session?.id, cultureId: culture?.id, count: 1 },
  });
  expect(made.status()).toBe(201);
  const body = (await made.json()) as { jars?: Named[]; items?: Named[] };
  const label = (body.jars ?? body.items)?.[0]?.label;
  if (!label) throw new Error('the jars API made no jar');
  return label;
}

describe('flagging a jar and reviewing the incident', () => {
  it('technician flags from a phone with a photo; supervisor sets it in review and confirms it; history shows both', async () => {
    const tech = await newPage(browser(), phone);
    await signIn(tech.page, 'technician');
    await tech.page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const label = await incubatingJar(tech.page);

    // The jar's page links to the flag screen with ?jar=; open that link, or the same address when the page has none.
    await tech.page.goto(`/j/${encodeURIComponent(label)}`);
    const flagLink = tech.page.locator(`a[href*="/incidents/new?jar="]`).first();
    if (await flagLink.isVisible({ timeout: 3000 }).catch(() => false)) await flagLink.click();
    else await tech.page.goto(`/incidents/new?jar=${encodeURIComponent(label)}`);

    await tech.page.getByRole('heading', { name: 'Flag a jar' }).waitFor();
    expect(await tech.page.getByLabel('Jar label').inputValue()).toBe(label);
    // The cautions stay on the form in one line; the whole text is a tap away.
    expect(await tech.page.getByText(/never open it indoors/).isVisible()).toBe(true);
    await tech.page.getByText('Green mould', { exact: true }).click();
    const photo = await new Jimp({ width: 640, height: 480, color: 0x3d8b4aff }).getBuffer('image/jpeg');
    await tech.page
      .locator('input[type=file]')
      .setInputFiles({ name: 'shelf.jpg', mimeType: 'image/jpeg', buffer: photo });
    await tech.page.getByRole('img', { name: 'shelf.jpg' }).waitFor();
    // Contaminant, photo and the button are within the first screen of a phone, without scrolling.
    for (const target of [
      tech.page.getByText('Green mould', { exact: true }),
      tech.page.getByText('Add another photo'),
      tech.page.getByRole('button', { name: 'Flag jar' }),
    ]) {
      const box = await target.boundingBox();
      expect(box!.y + box!.height).toBeLessThanOrEqual(phone.height);
    }
    await tech.page.getByText('More details (optional)').click();
    await tech.page.getByText('powdery', { exact: true }).click();
    await tech.page.getByText('High', { exact: true }).click();
    await tech.page.getByLabel('Sealed (lid closed, tape over the port)').check();
    await tech.page.screenshot({ path: `${shotsDir}/incident-flag-phone.png`, fullPage: true });
    await tech.page.getByRole('button', { name: 'Flag jar' }).click();
    await tech.page.waitForURL(/\/incidents\/\d+$/);
    const id = Number(new URL(tech.page.url()).pathname.split('/').pop());
    await tech.page.getByRole('heading', { name: `Incident ${id}` }).waitFor();
    expect(await tech.page.getByRole('link', { name: label }).count()).toBeGreaterThan(0);
    expect(await tech.page.locator('img[alt^="As found"]').count()).toBe(1);
    await tech.context.close();

    const sup = await newPage(browser(), desktop);
    await signIn(sup.page, 'supervisor');
    await sup.page
      .getByRole('navigation', { name: 'Main' })
      .first()
      .getByRole('link', { name: 'Incidents', exact: true })
      .click();
    await sup.page.getByRole('heading', { name: 'Incidents' }).waitFor();
    await sup.page.getByLabel('Jar label').fill(label);
    await sup.page.getByLabel('Jar label').press('Enter');
    await sup.page.getByRole('link', { name: `#${id}`, exact: true }).click();
    await sup.page.getByRole('heading', { name: `Incident ${id}` }).waitFor();
    const me = await json<{ displayName: string }>(sup.page, '/api/auth/me');

    await sup.page.getByRole('button', { name: 'Start review' }).click();
    await sup.page.getByRole('button', { name: 'Close', exact: true }).waitFor();
    await sup.page.getByRole('region', { name: 'Review' }).getByText('Confirmed', { exact: true }).click();
    await sup.page.getByRole('button', { name: 'Save review' }).click();
    const history = sup.page.getByRole('list', { name: 'History' });
    await history.getByText('Pending → Confirmed').waitFor();

    const entries = await history.locator('li').allInnerTexts();
    const statusEntry = entries.find((t) => t.includes('Status: Open → In review'));
    const verdictEntry = entries.find((t) => t.includes('Verdict: Pending → Confirmed'));
    expect(statusEntry).toContain(me.displayName);
    expect(verdictEntry).toContain(me.displayName);
    const times = await history.locator('time').evaluateAll((els) => els.map((e) => e.getAttribute('datetime') ?? ''));
    expect(times.filter((t) => Date.now() - Date.parse(t) < 5 * 60_000).length).toBeGreaterThanOrEqual(3);
    await sup.page.screenshot({ path: `${shotsDir}/incident-reviewed.png`, fullPage: true });
    await sup.context.close();
  });
});
