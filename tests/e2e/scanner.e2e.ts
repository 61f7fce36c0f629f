import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { newPage, phone, shotsDir, signIn, useBrowser } from './support/browser';
import { writeQrVideo } from './support/qr-video';
import { getJson, jarsOnAShelf } from './support/shelf-jars';

const video = path.resolve('.data/e2e-jar-qr.y4m');
// A stand-in until the test knows the jar's address: Chromium wants the file to exist at launch.
writeQrVideo(video, 'no jar yet');
const browser = useBrowser([
  '--use-fake-ui-for-media-stream',
  '--use-fake-device-for-media-stream',
  `--use-file-for-fake-video-capture=${video}`,
]);

describe('in-app scanner', () => {
  it('reads a jar’s QR code from the camera and opens the jar’s page', async () => {
    const { context, page } = await newPage(browser(), phone);
    await context.grantPermissions(['camera']);
    await signIn(page, 'technician');
    await page.getByRole('navigation', { name: 'Main' }).first().waitFor();
    const { jars } = await jarsOnAShelf(page, 1);
    const jar = jars[0]!;
    const story = await getJson<{ pageUrl: string }>(page, `/api/jars/${jar.id}`);
    // Chromium reads the fake camera file when the camera first opens, so it is written before.
    writeQrVideo(video, story.pageUrl);

    await page.getByRole('link', { name: 'Scan a QR code' }).click();
    await page.getByRole('heading', { name: 'Scan a jar' }).waitFor();
    await page.waitForURL(new RegExp(`/j/${jar.label}$`));
    await page.getByRole('heading', { name: jar.label }).waitFor();
    expect(new URL(page.url()).pathname).toBe(`/j/${jar.label}`);
    await page.screenshot({ path: `${shotsDir}/scanned-jar-phone.png` });
    await context.close();
  });
});
