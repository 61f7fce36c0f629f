import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { desktop, newPage, signIn, useBrowser } from './support/browser';

const browser = useBrowser();
const yesterday = () => new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);
const isoTimestamp = /\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;
const isoDay = /\b\d{4}-\d{2}-\d{2}\b/;

async function call<T>(page: Page, method: 'get' | 'post' | 'patch', url: string, data?: unknown): Promise<T> {
  const token = ((await (await page.request.get('/api/auth/csrf')).json()) as { token: string }).token;
  const res = await page.request[method](url, { headers: { 'X-CSRF-Token': token }, data });
  expect(res.status(), `${method} ${url}: ${await res.text()}`).toBeLessThan(300);
  return (await res.json()) as T;
}

describe('an incident’s history and its corrective actions', () => {
  it('reads in words on screen and on the print sheet, and closing an action shows its before/after', async () => {
    const sup = await newPage(browser(), desktop);
    await signIn(sup.page, 'supervisor');
    await sup.page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    const jars = await call<{ items: { label: string }[] }>(sup.page, 'get', '/api/jars?status=incubating&pageSize=1');
    const incident = await call<{ id: number }>(sup.page, 'post', '/api/incidents', {
      jarLabels: [jars.items[0]!.label],
      contaminant: 'trichoderma',
      severity: 'medium',
      stage: 'incubation',
      sealed: true,
      sterilisedBeforeDisposal: false,
    });
    const what = `Longer soak for rye ${Date.now()}`;
    const action = await call<{ id: number }>(sup.page, 'post', `/api/incidents/${incident.id}/actions`, {
      what,
      ownerName: 'Quill Ardent',
      dueOn: yesterday(),
      factor: 'grain',
      level: 'rye',
    });
    await call(sup.page, 'patch', `/api/corrective-actions/${action.id}`, { dueOn: '2026-11-20', reason: 'Later' });
    await call(sup.page, 'post', `/api/incidents/${incident.id}/review`, {
      verdict: 'confirmed',
      causeCategory: 'method',
    });

    const trainer = await newPage(browser(), desktop);
    await signIn(trainer.page, 'trainer');
    await trainer.page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
    const procs = await call<{ items: { id: number; title: string; currentVersionId: number }[] }>(
      trainer.page,
      'get',
      '/api/procedures',
    );
    const version = await call<{ steps: { id: number; position: number }[] }>(
      trainer.page,
      'get',
      `/api/procedure-versions/${procs.items[0]!.currentVersionId}`,
    );
    const step = version.steps[0]!;
    await call(trainer.page, 'post', `/api/incidents/${incident.id}/step-links`, {
      stepId: step.id,
      note: 'Soak cut short',
    });
    await trainer.context.close();

    const { page } = sup;
    await page.goto(`/incidents/${incident.id}`);
    const actionItem = page.locator(`#action-${action.id}`);
    await actionItem.getByRole('button', { name: 'Mark done…' }).click();
    // The close form shows the before/after for the day entered; the after-period of today is not complete.
    const preview = actionItem.getByTestId('before-after');
    await preview.waitFor();
    expect(await actionItem.textContent()).toMatch(/Before and after if done on .*: grain rye/);
    expect(await preview.textContent()).toMatch(/Not settled yet: .* for \d+ more days/);
    await actionItem.getByLabel('How was the fix verified?').fill('Next three batches soaked 12 h, logged');
    await actionItem.getByRole('button', { name: 'Mark done' }).click();
    await actionItem.getByText(/^Done /).waitFor();
    // The closed action keeps its figures, now for the day it was done.
    await actionItem.getByText('Before and after: grain rye', { exact: true }).waitFor();
    expect(await actionItem.getByTestId('before-after').count()).toBe(1);

    const history = page.getByRole('list', { name: 'History' });
    await history.getByText(`Changed the corrective action “${what}” (owner Quill Ardent)`).first().waitFor();
    const text = (await history.innerText()).trim();
    expect(text).toContain('Reported the incident');
    expect(text).toContain(`Added the corrective action “${what}” for Quill Ardent`);
    expect(text).toContain(`Linked to step ${step.position} of ${procs.items[0]!.title}`);
    expect(text).toContain('Verdict: Pending → Confirmed');
    expect(text).not.toMatch(isoTimestamp);
    expect(text).not.toMatch(isoDay);
    expect(text).not.toContain('{');
    expect(text).not.toMatch(/: —/);

    // The print sheet is this page under print styles: the same words, nothing raw.
    await page.emulateMedia({ media: 'print' });
    const sheet = await page.locator('main').innerText();
    expect(sheet).toContain('Reported the incident');
    expect(sheet).toContain(`Linked to step ${step.position} of ${procs.items[0]!.title}`);
    expect(sheet).not.toMatch(isoTimestamp);
    expect(sheet).not.toContain('{');
    await sup.context.close();
  });
});
