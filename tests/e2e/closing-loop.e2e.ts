import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { LethalityDto } from '../../shared/schemas/analysis-lethality';
import type { WeeklyDto } from '../../shared/schemas/analysis-weekly';
import { plantedProblems, weekBefore } from '../../server/demo-lab/planted-problems';
import { mailsTo } from '../setup/mail-sink';
import { desktop, newPage, shotsDir, signIn, useBrowser } from './support/browser';
import { countOf } from '../../src/lib/count-text';

const browser = useBrowser();
const daysFrom = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

async function call<T>(page: Page, method: 'get' | 'post', url: string, data?: unknown): Promise<T> {
  const token = ((await (await page.request.get('/api/auth/csrf')).json()) as { token: string }).token;
  const res = await page.request[method](url, { headers: { 'X-CSRF-Token': token }, data });
  expect(res.status(), `${method} ${url}`).toBeLessThan(300);
  return (await res.json()) as T;
}

describe('closing the loop', () => {
  it('shows a new incident and an overdue action in the supervisor’s queue, mails the owner once, and each link opens its record', async () => {
    const { context, page } = await newPage(browser(), desktop);
    await signIn(page, 'supervisor');
    await page.getByRole('heading', { name: 'Waiting for you' }).waitFor();

    const jars = await call<{ items: { label: string }[] }>(page, 'get', '/api/jars?status=incubating&pageSize=1');
    const incident = await call<{ id: number }>(page, 'post', '/api/incidents', {
      jarLabels: [jars.items[0]!.label],
      contaminant: 'trichoderma',
      severity: 'medium',
      stage: 'incubation',
      sealed: true,
      sterilisedBeforeDisposal: false,
    });
    const email = `owner-${Date.now()}@example.invalid`;
    const what = `Replace the hood pre-filter ${Date.now()}`;
    const action = await call<{ id: number }>(page, 'post', `/api/incidents/${incident.id}/actions`, {
      what,
      ownerName: 'Quill Ardent',
      ownerEmail: email,
      dueOn: daysFrom(-1),
    });
    // Assigned: one mail. Reminders run twice, as two instances would: one overdue mail.
    expect(mailsTo(email).map((m) => m.subject)).toEqual([
      `Corrective action for incident #${incident.id}, due ${daysFrom(-1)}`,
    ]);
    await call(page, 'post', '/api/corrective-actions/reminders');
    await call(page, 'post', '/api/corrective-actions/reminders');
    expect(mailsTo(email).filter((m) => m.subject.startsWith('Overdue'))).toHaveLength(1);

    // Oldest first: other browser tests may have left older open incidents ahead of the new one, so
    // the queue's own answer says which incident its first link must open, and its total counts ours.
    const queue = await call<{ incidentsToReview: { items: { id: number }[]; total: number } }>(
      page,
      'get',
      '/api/queue',
    );
    const shown = queue.incidentsToReview.items.map((i) => i.id);
    const target = shown.includes(incident.id) ? incident.id : shown[0]!;
    const all = await call<{ total: number }>(page, 'get', '/api/incidents?status=open&voided=false&pageSize=1');
    expect(queue.incidentsToReview.total).toBeGreaterThanOrEqual(all.total);
    await page.reload();
    const review = page.getByRole('region', { name: /Incidents to review/ });
    await review.getByRole('link', { name: new RegExp(`^#${target} `) }).click();
    await page.getByRole('heading', { name: `Incident ${target}` }).waitFor();
    await page.goBack();
    const overdue = page.getByRole('region', { name: 'Corrective actions overdue' });
    await overdue.getByRole('link', { name: what }).click();
    await page.waitForURL(new RegExp(`/incidents/${incident.id}#action-${action.id}$`));
    await page.getByText(what).first().waitFor();
    await page.screenshot({ path: path.join(shotsDir, 'incident-history.png'), fullPage: true });
    await page.goto('/');
    await page.getByRole('heading', { name: 'Waiting for you' }).waitFor();
    await page.screenshot({ path: path.join(shotsDir, 'supervisor-home.png'), fullPage: true });

    await page.goto('/actions?state=overdue');
    await page.getByRole('heading', { name: 'Corrective actions', level: 1 }).waitFor();
    await page.getByRole('link', { name: what }).waitFor();
    await page.screenshot({ path: path.join(shotsDir, 'actions-list.png'), fullPage: true });
    await context.close();
  });

  it('opens the jars behind a weekly cell and each jar links its incident', async () => {
    const { context, page } = await newPage(browser(), desktop);
    await signIn(page, 'supervisor');
    await page.getByRole('heading', { name: 'Waiting for you' }).waitFor();
    await page.goto('/analysis/weekly');
    const weekly = (await (await page.request.get('/api/analysis/weekly')).json()) as WeeklyDto;
    const week = weekly.weeks.find((w) => !w.provisional && w.contaminated > 0)!;
    await page.getByRole('link', { name: `${countOf(week.contaminated, 'contaminated jar')} of ${week.week}` }).click();
    await page.getByRole('heading', { name: new RegExp(`^Contaminated jars: .*${week.week}`) }).waitFor();
    const incidentLink = page.getByRole('link', { name: /^#\d+$/ }).first();
    await incidentLink.waitFor();
    const id = ((await incidentLink.textContent()) ?? '').slice(1);
    expect(id).toMatch(/^\d+$/);
    await incidentLink.click();
    await page.getByRole('heading', { name: `Incident ${id}` }).waitFor();
    await context.close();
  });

  it('lists the short cook run below its cook target and marks its week above the lab’s target', async () => {
    const { context, page } = await newPage(browser(), desktop);
    await signIn(page, 'supervisor');
    await page.getByRole('heading', { name: 'Waiting for you' }).waitFor();
    const code = plantedProblems.shortCookRun.code;
    const lethalityRes = await page.request.get('/api/analysis/lethality?only=below');
    expect(lethalityRes.status()).toBe(200);
    const lethality = (await lethalityRes.json()) as LethalityDto;
    expect(lethality.runs.find((r) => r.cookRun === code)).toMatchObject({ belowTarget: true, judgedBy: 'minutes' });
    // The screen pages the runs newest first; its filter brings the low ones together.
    await page.goto('/analysis/lethality');
    await page.getByLabel('Show').selectOption('below');
    await page.getByRole('rowheader', { name: code }).waitFor();
    expect(await page.getByRole('rowheader').allTextContents()).toEqual(lethality.runs.map((r) => r.cookRun));
    await page.goto('/cook-runs?belowTarget=true');
    await page.getByRole('link', { name: code }).waitFor();
    await page.goto('/analysis/weekly');
    const weekly = (await (await page.request.get('/api/analysis/weekly')).json()) as WeeklyDto;
    const shortWeek = weekBefore(weekly.to, plantedProblems.shortCookRun.weeksBeforeCurrent);
    const row = page.getByTestId(`week-${shortWeek}`);
    await row.getByText('Above target').waitFor();
    expect(weekly.weeks.some((w) => w.aboveTarget && !w.outOfControl)).toBe(true);
    expect(await page.getByTestId('target-note').textContent()).toContain('means as usual for this lab');
    await context.close();
  });
});
