import { describe, expect, it } from 'vitest';
import { desktop, newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';

const browser = useBrowser();

// Screens each demo role should see in the main navigation, and ones it must not (DESIGN.md §2).
const everyone = [
  'Home',
  'Analysis',
  'Cook runs',
  'Cultures',
  'Sessions',
  'Jars',
  'Incidents',
  'Actions',
  'Procedures',
  'Account',
];
const expected = {
  technician: {
    sees: [...everyone, 'Shelf walk', 'Flag a jar'],
    hidden: ['Users', 'Lab settings', 'History import', 'This week', 'Training'],
  },
  supervisor: {
    sees: [...everyone, 'This week', 'Flag a jar', 'History import', 'Training'],
    hidden: ['Users', 'Lab settings', 'Sent mail'],
  },
  trainer: {
    sees: [...everyone, 'Training'],
    hidden: ['Users', 'Lab settings', 'Flag a jar', 'Shelf walk', 'History import'],
  },
  admin: {
    sees: [...everyone, 'Users', 'Lab settings', 'History import', 'Sent mail'],
    hidden: ['Flag a jar', 'This week'],
  },
} as const;

describe('signing in', () => {
  it.each(Object.keys(expected) as (keyof typeof expected)[])(
    'shows the %s the navigation of their role',
    async (role) => {
      const { context, page } = await newPage(browser(), desktop);
      await signIn(page, role);
      const nav = page.getByRole('navigation', { name: 'Main' }).first();
      await nav.waitFor();
      for (const label of expected[role].sees) {
        expect(await nav.getByRole('link', { name: label, exact: true }).count()).toBe(1);
      }
      for (const label of expected[role].hidden) {
        expect(await nav.getByRole('link', { name: label, exact: true }).count()).toBe(0);
      }
      await page.screenshot({ path: `${shotsDir}/home-${role}.png` });
      await context.close();
    },
  );

  it('tells the user plainly when the password is wrong', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'trainer', 'not-the-password');
    const alert = page.getByRole('alert').filter({ hasText: 'Username or password is wrong.' });
    await alert.waitFor();
    expect(await alert.isVisible()).toBe(true);
    await page.screenshot({ path: `${shotsDir}/sign-in-wrong-password-phone.png` });
    await context.close();
  });

  it('locks a username after ten failures while another user still signs in', async () => {
    const { context, page } = await newPage(browser(), desktop);
    const csrf = async () => ((await (await page.request.get('/api/auth/csrf')).json()) as { token: string }).token;
    // A user of its own: locking a demo account would lock it for every later browser test.
    await signIn(page, 'admin');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const username = `lockout-${Date.now()}`;
    const created = await page.request.post('/api/users', {
      headers: { 'X-CSRF-Token': await csrf() },
      data: { username, displayName: 'Lockout Check', role: 'technician', password: 'lockout-check-pass' },
    });
    expect(created.status()).toBe(201);
    await page.request.post('/api/auth/logout', { headers: { 'X-CSRF-Token': await csrf() } });

    for (let i = 0; i < 10; i += 1) {
      const res = await page.request.post('/api/auth/login', {
        headers: { 'X-CSRF-Token': await csrf() },
        data: { username, password: `wrong-${i}` },
      });
      expect(res.status()).toBe(401);
    }
    await signIn(page, username, 'lockout-check-pass');
    await page.getByRole('alert').filter({ hasText: 'Too many failed sign-ins' }).waitFor();

    const other = await newPage(browser(), desktop);
    await signIn(other.page, 'technician');
    await other.page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    expect(other.page.url()).not.toContain('/sign-in');
    await other.context.close();
    await context.close();
  });
});
