import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, beforeAll, inject } from 'vitest';

export const appUrl = () => inject('appUrl');
export const phone = { width: 390, height: 844 };
export const desktop = { width: 1280, height: 800 };
export const shotsDir = path.resolve('.data/screenshots');

const executablePath = process.env.CHROMIUM_PATH ?? '/usr/lib/chromium/chromium';

/** One headless Debian chromium per test file; playwright gives each launch a fresh profile directory. */
export function useBrowser(extraArgs: string[] = []): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    mkdirSync(shotsDir, { recursive: true });
    browser = await chromium.launch({
      executablePath,
      headless: true,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--no-first-run',
        ...extraArgs,
      ],
    });
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('browser not started');
    return browser;
  };
}

export async function newPage(browser: Browser, viewport = desktop): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport, baseURL: appUrl() });
  const page = await context.newPage();
  return { context, page };
}

export async function signIn(page: Page, username: string, password = 'asepta-demo') {
  await page.goto('/');
  await page.getByLabel('Username').fill(username);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}
