import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { WeeklyDto } from '../../shared/schemas/analysis-weekly';
import { plantedProblems, sloppyIsoWeek, weekBefore } from '../../server/demo-lab/planted-problems';
import { desktop, newPage, shotsDir, signIn, useBrowser } from './support/browser';

const browser = useBrowser();

describe('the supervisor reads the analysis of the demo lab', () => {
  it('sees the weekly table at home, opens it, finds the planted weeks at the top and the short run week out of control', async () => {
    const { context, page } = await newPage(browser(), desktop);
    await signIn(page, 'supervisor');
    await expect.poll(() => page.getByRole('heading', { name: 'Contamination, week by week' }).count()).toBe(1);

    await page.getByRole('link', { name: 'This week' }).first().click();
    await page.getByRole('heading', { name: 'Weekly table', level: 1 }).waitFor();
    const weekly = (await (await page.request.get('/api/analysis/weekly')).json()) as WeeklyDto;
    const sloppy = sloppyIsoWeek(weekly.to);
    const shortRun = weekBefore(weekly.to, plantedProblems.shortCookRun.weeksBeforeCurrent);
    await page.getByTestId(`week-${sloppy}`).waitFor();
    const worst = (await page.getByTestId('worst-weeks').textContent()) ?? '';
    expect(worst).toContain(sloppy);
    expect(worst).toContain(shortRun);
    for (const w of weekly.weeks) expect(w.outOfControl && w.provisional).toBe(false);
    // The short run's week crosses its upper 3-sigma limit (Montgomery, Introduction to Statistical Quality Control, ch. 7).
    const flagged = weekly.weeks.filter((w) => w.outOfControl).map((w) => w.week);
    expect(flagged).toContain(shortRun);
    expect(flagged.every((w) => [shortRun, sloppy].includes(w))).toBe(true);
    const row = page.getByTestId(`week-${shortRun}`);
    expect(await row.getByText('Out of control').count()).toBe(1);
    expect(await page.getByText(`Out of control: ${flagged.join(', ')}.`).count()).toBe(1);
    expect(await page.getByText('p-chart: contaminated share per ISO week').count()).toBe(1);
    // The current week still holds incubating jars.
    expect(weekly.weeks.at(-1)?.provisional).toBe(true);
    await page.screenshot({ path: path.join(shotsDir, 'analysis-weekly.png'), fullPage: true });
    await context.close();
  });

  it('finds the short cook run, the bad culture and the sloppy operator at the top of the likely causes', async () => {
    const { context, page } = await newPage(browser(), desktop);
    await signIn(page, 'supervisor');
    await page.getByRole('link', { name: 'Analysis' }).first().click();
    await page.getByRole('heading', { name: 'Likely causes', level: 1 }).waitFor();
    expect(await page.getByText('An association is a lead, not proof').count()).toBe(1);
    expect(await page.getByText('Jars from one run or one culture are not independent', { exact: false }).count()).toBe(
      1,
    );

    await page.getByTestId('cause-row').first().waitFor();
    const levels = await page.getByTestId('cause-level').allTextContents();
    const top = levels.slice(0, 6);
    expect(top).toContain(plantedProblems.shortCookRun.code);
    expect(top).toContain(plantedProblems.badCulture.code);
    expect(top).toContain(plantedProblems.sloppyWeek.operator);
    expect(await page.getByText('common practice', { exact: false }).count()).toBeGreaterThan(0);

    await page.screenshot({ path: path.join(shotsDir, 'analysis-causes.png'), fullPage: false });
    // Each number links to the jars behind it.
    const first = page.getByTestId('cause-row').first();
    await first.getByRole('link').first().click();
    await page.getByRole('heading', { name: /^Contaminated jars:/ }).waitFor();
    expect(await page.getByRole('link', { name: /.+/ }).count()).toBeGreaterThan(0);
    await page.screenshot({ path: path.join(shotsDir, 'analysis-jars-behind.png'), fullPage: true });
    await context.close();
  });
});
