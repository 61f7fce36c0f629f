import { randomBytes } from 'node:crypto';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { desktop, newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';

const browser = useBrowser();
const unique = (prefix: string) => `${prefix}-${randomBytes(3).toString('hex')}`;

async function call<T>(page: Page, method: 'get' | 'post', url: string, data?: unknown): Promise<T> {
  const token = ((await (await page.request.get('/api/auth/csrf')).json()) as { token: string }).token;
  const res = await page.request[method](url, { headers: { 'X-CSRF-Token': token }, data });
  expect(res.status(), `${method} ${url}`).toBeLessThan(300);
  return (await res.json()) as T;
}

describe('people of the lab', () => {
  it('makes an admin-reset user set a new password at sign-in before anything else', async () => {
    const admin = await newPage(browser(), desktop);
    await signIn(admin.page, 'admin');
    await admin.page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const username = unique('reset');
    await call(admin.page, 'post', '/api/users', {
      username,
      displayName: 'Oriel Fenwright',
      role: 'technician',
      password: 'first-password-1',
    });
    await admin.page.goto(`/users?q=${username}`);
    await admin.page.getByRole('button', { name: 'Reset password of Oriel Fenwright' }).click();
    await admin.page.getByRole('dialog').getByRole('button', { name: 'Reset password' }).click();
    const shown = admin.page.getByRole('dialog', { name: 'New password for Oriel Fenwright' }).locator('code');
    await shown.waitFor();
    const temporary = (await shown.textContent())?.trim() ?? '';
    expect(temporary).toMatch(/^[A-Za-z2-9]{14}$/);
    await admin.page.screenshot({ path: `${shotsDir}/users-reset-shown.png` });
    await admin.page.getByRole('button', { name: 'Done' }).click();
    await admin.page.getByText('Must set a new password').waitFor();
    await admin.context.close();

    const { context, page } = await newPage(browser(), phone);
    await signIn(page, username, temporary);
    await page.waitForURL(/\/set-password$/);
    await page.getByRole('heading', { name: 'Set a new password' }).waitFor();
    const held = await page.request.get('/api/jars');
    expect(held.status()).toBe(403);
    expect(((await held.json()) as { error: { code: string } }).error.code).toBe('password-change-required');
    await page.goto('/jars');
    await page.waitForURL(/\/set-password$/);
    await page.screenshot({ path: `${shotsDir}/set-password-phone.png` });
    await page.getByLabel('Temporary password').fill(temporary);
    await page.getByLabel('New password', { exact: true }).fill('my-own-password-2');
    await page.getByLabel('New password again').fill('my-own-password-2');
    await page.getByRole('button', { name: 'Change password' }).click();
    await page.getByRole('heading', { name: /Oriel Fenwright/ }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await signIn(page, username, temporary);
    await page.getByRole('alert').filter({ hasText: 'Username or password is wrong.' }).waitFor();
    await signIn(page, username, 'my-own-password-2');
    await page.getByRole('heading', { name: /Oriel Fenwright/ }).waitFor();
    await context.close();
  });

  it('trains a staff member without an account and lists the training', async () => {
    const { context, page } = await newPage(browser(), desktop);
    await signIn(page, 'trainer');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const name = `Wendel Ashgrove ${randomBytes(2).toString('hex')}`;
    await call(page, 'post', '/api/staff', { name });
    await page.goto('/training');
    const row = page.getByRole('row', { name: new RegExp(name) });
    await row.getByText('Staff, no account').waitFor();
    await row.getByRole('button', { name: `Record training for ${name}` }).click();
    const dialog = page.getByRole('dialog', { name: `Record training: ${name}` });
    await dialog.getByRole('button', { name: 'Record training' }).click();
    await page
      .getByRole('listitem')
      .filter({ hasText: `${name} on version` })
      .waitFor();
    await row.getByText('current version').waitFor();
    expect(
      await page
        .getByRole('listitem')
        .filter({ hasText: `${name} on version` })
        .count(),
    ).toBe(1);
    await page.screenshot({ path: `${shotsDir}/training-staff.png`, fullPage: true });
    await context.close();
  });
});
