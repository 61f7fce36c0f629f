import { describe, expect, it } from 'vitest';
import { newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';
import { jarsOnAShelf } from './support/shelf-jars';

const browser = useBrowser();
describe('jars on a phone', () => {
  it('opens a jar from its QR address and walks a shelf of three jars', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'technician');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const { jars, shelf } = await jarsOnAShelf(page, 3);

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
    await page.getByRole('button', { name: 'Start the walk' }).click();
    for (const [i, mark] of (['Clean', 'Colonised', 'Shaken'] as const).entries()) {
      await page.getByText(`${i + 1} of 3`, { exact: true }).waitFor();
      expect(await page.getByRole('link', { name: jars[i]!.label }).isVisible()).toBe(true);
      if (i === 1) await page.screenshot({ path: `${shotsDir}/shelf-walk-jar-phone.png` });
      await page.getByRole('button', { name: mark, exact: true }).click();
    }
    // Each mark is saved as it is made: nothing to press at the end of the shelf.
    await page.getByRole('link', { name: 'See this shelf’s jars' }).waitFor();
    await page.getByText('3 marked · all saved').waitFor();
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
    const { jars } = await jarsOnAShelf(page, 3);
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
