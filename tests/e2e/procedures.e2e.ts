import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { newPage, signIn, useBrowser } from './support/browser';

const browser = useBrowser();

async function json<T>(page: Page, url: string): Promise<T> {
  const res = await page.request.get(url);
  expect(res.status()).toBe(200);
  return (await res.json()) as T;
}

interface ProcedureRow {
  id: number;
  code: string;
  currentVersionId: number;
}

async function sterileTechnique(page: Page): Promise<ProcedureRow> {
  const list = await json<{ items: ProcedureRow[] }>(page, '/api/procedures?pageSize=200');
  const found = list.items.find((p) => p.code === 'STERILE-INOC');
  if (!found) throw new Error('the demo lab has no sterile-technique procedure');
  return found;
}

const stepTexts = (page: Page) => page.locator('[data-testid^="step-"] > p.font-semibold').allInnerTexts();

describe('procedures in the browser', () => {
  it('trainer finds an incident by typing #<n>, links it to a step, sees it listed and unlinks it', async () => {
    const { page, context } = await newPage(browser());
    await signIn(page, 'trainer');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const procedure = await sterileTechnique(page);
    const incidents = await json<{ items: { id: number }[] }>(page, '/api/incidents?pageSize=1');
    const incidentId = incidents.items[0]?.id;
    if (!incidentId) throw new Error('the demo lab has no incident to link');

    await page.goto(`/procedures/versions/${procedure.currentVersionId}`);
    const step = page.getByTestId('step-6');
    const count = step.getByTestId('incidents-linked');
    await count.waitFor();
    const before = Number(await count.innerText());

    await step.getByRole('button', { name: 'Link an incident to step 6' }).click();
    await page.getByLabel('Find an incident').fill(`#${incidentId}`);
    await page.getByRole('radio', { name: new RegExp(`^#${incidentId} `) }).check();
    await page.getByLabel('Suspected lapse').fill('Needle touched the port before it had cooled.');
    await page.getByRole('button', { name: 'Link incident' }).click();
    await expect.poll(async () => Number(await count.innerText()), { timeout: 10_000 }).toBe(before + 1);
    const linked = step.getByRole('list', { name: 'Linked incidents' });
    await linked.getByRole('link', { name: `Incident #${incidentId}` }).waitFor();

    await linked.getByRole('button', { name: `Unlink #${incidentId}` }).click();
    await page.getByRole('button', { name: 'Unlink', exact: true }).click();
    await expect.poll(async () => Number(await count.innerText()), { timeout: 10_000 }).toBe(before);
    // The count and the list are two answers: wait for the list too, not just the count.
    await expect
      .poll(() => step.getByRole('link', { name: `Incident #${incidentId}` }).count(), { timeout: 10_000 })
      .toBe(0);
    await context.close();
  });

  it('publishing a new version leaves the old one readable and unchanged', async () => {
    const { page, context } = await newPage(browser());
    await signIn(page, 'trainer');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const procedure = await sterileTechnique(page);
    const oldId = procedure.currentVersionId;

    await page.goto(`/procedures/versions/${oldId}`);
    await page.getByTestId('step-1').waitFor();
    const oldSteps = await stepTexts(page);

    await page.goto(`/procedures/${procedure.id}`);
    await page.getByRole('button', { name: 'Publish a new version' }).click();
    await page
      .getByLabel('What changed and why')
      .fill('Gloves are wiped again after touching anything outside the hood.');
    await page
      .getByLabel('Step 3', { exact: true })
      .fill(
        'Put on clean gloves; wipe them with 70 % isopropyl alcohol again after touching anything outside the hood.',
      );
    await page.getByRole('button', { name: 'Publish', exact: true }).click();
    await page.waitForURL(
      (url) => /\/procedures\/versions\/\d+$/.test(url.pathname) && !url.pathname.endsWith(`/${oldId}`),
    );
    await page.getByText('current version', { exact: true }).waitFor();
    const newSteps = await stepTexts(page);
    expect(newSteps[2]).toContain('again after touching anything outside the hood');

    await page.goto(`/procedures/versions/${oldId}`);
    await page.getByText('superseded', { exact: true }).waitFor();
    expect(await stepTexts(page)).toEqual(oldSteps);
    await context.close();
  });
});
