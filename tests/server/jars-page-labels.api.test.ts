import QRCode from 'qrcode';
import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { labelSheetRowSchema } from '../../shared/schemas/jar-labels';
import { batchBody, jarEvent, jarFixtures, makeJars, storyOf } from './jars.fixtures';
import { bodyOf, itemsOf } from '../setup/bodies';

const app = createTestApp();

describe('the jar page, QR code and label sheet', () => {
  it('tells the whole story in time order, with the ancestry up to the culture', async () => {
    const tech = await signedIn(app, 'technician');
    const parentCulture = await jarFixtures.culture();
    const culture = await jarFixtures.culture('released', parentCulture.id);
    const batch = await jarFixtures.prepBatch();
    const cookRun = await jarFixtures.cookRun();
    const [parent] = await makeJars(tech, await batchBody({ count: 1, cultureId: culture.id }));
    await jarEvent(tech, parent!.id, { type: 'colonised', at: '2026-05-16T09:00:00Z' }).expect(201);
    const session = await jarFixtures.session('2026-05-20');
    const [jar] = await makeJars(
      tech,
      await batchBody({
        count: 1,
        sessionId: session.id,
        cultureId: undefined,
        parentJarId: parent!.id,
        prepBatchId: batch.id,
        cookRunId: cookRun.id,
        inoculatedAt: '2026-05-20T11:00:00Z',
      }),
    );
    await jarEvent(tech, jar!.id, { type: 'check', percentColonised: 30, at: '2026-05-25T08:00:00Z' }).expect(201);
    await jarEvent(tech, jar!.id, { type: 'shaken', at: '2026-05-25T08:05:00Z' }).expect(201);

    const res = await tech.agent.get(`/api/jars/by-label/${jar!.label}`);
    expect(res.status).toBe(200);
    const story = storyOf(res);
    expect(story.jar).toMatchObject({ id: jar!.id, parentJarLabel: parent!.label, cookRunCode: cookRun.code });
    expect(story.ancestry.map((a) => (a.kind === 'jar' ? a.label : a.code))).toEqual([
      parent!.label,
      culture.code,
      parentCulture.code,
    ]);
    expect(story.events.map((e) => e.type)).toEqual(['check', 'shaken']);
    expect(story.pageUrl).toMatch(new RegExp(`/j/${jar!.label}$`));
    const kinds = story.timeline.map((t) => t.kind);
    expect(kinds).toEqual([
      'culture',
      'culture',
      'grain-prep',
      'cook-run',
      'culture',
      'session',
      'inoculated',
      'event',
      'event',
    ]);
    const times = story.timeline.map((t) => (t.at.length === 10 ? `${t.at}T00:00:00.000Z` : t.at));
    expect([...times].sort()).toEqual(times);
    expect(storyOf(await tech.agent.get(`/api/jars/${jar!.id}`)).jar.label).toBe(jar!.label);
  });

  it('draws a QR code that encodes the public jar address', async () => {
    const tech = await signedIn(app, 'technician');
    const [jar] = await makeJars(tech, await batchBody({ count: 1 }));
    const res = await tech.agent
      .get(`/api/jars/${jar!.id}/qr.svg`)
      .buffer(true)
      .parse((r, cb) => {
        let text = '';
        r.on('data', (c: Buffer) => (text += c.toString()));
        r.on('end', () => cb(null, text));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('image/svg+xml');
    const url = `http://127.0.0.1:5180/j/${jar!.label}`;
    expect(res.body).toBe(await QRCode.toString(url, { type: 'svg', errorCorrectionLevel: 'M', margin: 1 }));
  });

  it('lists a session’s labels for the sheet, with the page address and QR path', async () => {
    const tech = await signedIn(app, 'technician');
    const body = await batchBody({ count: 4 });
    const jars = await makeJars(tech, body);
    const res = await tech.agent.get(`/api/jars/labels?sessionId=${body.sessionId}`);
    expect(res.status).toBe(200);
    const sheet = bodyOf(res, itemsOf(labelSheetRowSchema));
    expect(sheet.items.map((l) => l.label)).toEqual(jars.map((j) => j.label));
    expect(sheet.items[0]).toMatchObject({
      qrPath: `/api/jars/${jars[0]!.id}/qr.svg`,
      grain: 'rye',
      pageUrl: `http://127.0.0.1:5180/j/${jars[0]!.label}`,
    });
    const byIds = await tech.agent.get(`/api/jars/labels?ids=${jars[2]!.id},${jars[0]!.id}`);
    expect(bodyOf(byIds, itemsOf(labelSheetRowSchema)).items.map((l) => l.id)).toEqual([jars[2]!.id, jars[0]!.id]);
  });

  it('exports the filtered jars as CSV', async () => {
    const tech = await signedIn(app, 'technician');
    const body = await batchBody({ count: 3 });
    const jars = await makeJars(tech, body);
    const res = await tech.agent.get(`/api/jars/export.csv?sessionId=${body.sessionId}&sort=-label`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('text/csv');
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe(
      'label,status,grain,prep_batch,cook_run,session,culture,parent_jar,inoculum_ml,room,shelf,shelf_position,inoculated_at,inoculated_on,colonised_on,ended_on',
    );
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(jars.map((j) => j.label).reverse());
  });
});
