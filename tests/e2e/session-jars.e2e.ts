import { describe, expect, it } from 'vitest';
import { newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';
import { getJson, post, stamp } from './support/shelf-jars';

const browser = useBrowser();

describe('a session on a phone', () => {
  it('suggests the next session code, lists the session’s jars and makes more from a picker without retired cultures', async () => {
    const { context, page } = await newPage(browser(), phone);
    await signIn(page, 'supervisor');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const tag = stamp();
    const today = new Date().toISOString().slice(0, 10);

    // The form counts on from the lab's latest session code, keeping its width.
    const session = await post<{ id: number }>(page, '/api/sessions', {
      code: `E2E-${tag}-0041`,
      heldOn: today,
      operatorName: 'E2E operator',
      workspace: 'flow-hood',
    });
    await page.goto('/sessions');
    await page.getByRole('button', { name: 'New session' }).click();
    const code = page.getByRole('textbox', { name: 'Code' });
    await page.waitForFunction(
      (want) => (document.querySelector<HTMLInputElement>('input[name="code"]')?.value ?? '') === want,
      `E2E-${tag}-0042`,
    );
    expect(await code.inputValue()).toBe(`E2E-${tag}-0042`);
    await page.getByRole('button', { name: 'Cancel' }).click();

    const quarantined = await post<{ id: number }>(page, '/api/cultures', {
      code: `E2E-Q-${tag}`,
      species: 'Pleurotus djamor',
    });
    const retired = await post<{ id: number }>(page, '/api/cultures', { code: `E2E-R-${tag}` });
    await post(page, `/api/cultures/${retired.id}/state`, { state: 'retired', reason: 'used up' });
    const grains = await getJson<{ id: number; name: string }[]>(page, '/api/grains');
    const rye = grains.find((g) => g.name === 'rye')!.id;
    await post(page, '/api/jars/batch', { sessionId: session.id, count: 3, grainId: rye, cultureId: quarantined.id });

    // The session page lists its jars, paged on the server, each linked to its page.
    await page.goto(`/sessions/${session.id}?pageSize=2`);
    const jars = page.getByRole('region', { name: 'Jars of this session' });
    // Loading rows come first; the pager's count and the rows' links say the page has arrived.
    await page.getByText('Showing 1–2 of 3').waitFor();
    await jars.getByRole('link').nth(1).waitFor();
    expect(await jars.getByRole('link').count()).toBe(2);
    await page.getByRole('heading', { name: 'Jars (3)' }).waitFor();
    await page.screenshot({ path: `${shotsDir}/session-jars-phone.png`, fullPage: true });

    await page.getByRole('link', { name: 'Make more jars' }).click();
    await page.waitForURL(new RegExp(`/jars/new\\?session=${session.id}$`));
    const sessionSelect = page.getByRole('combobox', { name: 'Session' });
    await sessionSelect.waitFor();
    expect(await sessionSelect.inputValue()).toBe(String(session.id));

    // The picker names species, leaves the retired culture out and warns in words on a quarantined one.
    const picker = page.getByRole('combobox', { name: 'Culture' });
    const offered = await picker.locator('option').allTextContents();
    expect(offered).toContain(`E2E-Q-${tag} · Pleurotus djamor (quarantined)`);
    expect(offered.some((o) => o.startsWith(`E2E-R-${tag}`))).toBe(false);
    await picker.selectOption({ label: `E2E-Q-${tag} · Pleurotus djamor (quarantined)` });
    const warning = page.getByText(`E2E-Q-${tag} is quarantined:`);
    await warning.waitFor();
    expect(await warning.isVisible()).toBe(true);
    await page.screenshot({ path: `${shotsDir}/culture-picker-phone.png`, fullPage: true });

    await page.getByRole('spinbutton', { name: 'Number of jars' }).fill('2');
    await page.getByRole('combobox', { name: 'Grain' }).selectOption({ label: 'rye' });
    await page.getByRole('button', { name: 'Make jars' }).click();
    await page.getByRole('link', { name: 'See the session’s jars' }).click();
    await page.getByRole('heading', { name: 'Jars (5)' }).waitFor();
    const list = await getJson<{ total: number }>(page, `/api/jars?sessionId=${session.id}`);
    expect(list.total).toBe(5);
    await context.close();
  });
});
