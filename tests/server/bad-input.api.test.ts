import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { jarBatchResultSchema } from '../../shared/schemas/jars';
import { rejectionOf } from './imports.fixtures';
import { jarFixtures } from './jars.fixtures';
import { postCsvAs, sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { bodyOf, errorOf, issuePath } from '../setup/bodies';
import { runOf } from './cook-runs.fixtures';

const app = createTestApp();

let admin: Client;
let supervisor: Client;
beforeAll(async () => {
  admin = await signedIn(app, 'admin');
  supervisor = await signedIn(app, 'supervisor');
});

// Every register that takes `sort`; the names are those an object literal inherits from Object.prototype.
const registers = [
  '/api/users',
  '/api/jars',
  '/api/incidents',
  '/api/cook-runs',
  '/api/cultures',
  '/api/sessions',
  '/api/grain-lots',
  '/api/prep-batches',
  '/api/procedures',
  '/api/training-records',
  '/api/training/retrain-requests',
  '/api/mail/sent',
];
const inheritedNames = ['constructor', 'toString', 'valueOf', 'hasOwnProperty', '__proto__', '-constructor'];

describe('sort names inherited from Object.prototype', () => {
  it.each(registers)('%s answers 400 naming sort for each inherited name', async (url) => {
    for (const name of inheritedNames) {
      const res = await admin.agent.get(url).query({ sort: name });
      expect({ url, name, status: res.status }).toEqual({ url, name, status: 400 });
      expect(issuePath(res)).toBe('sort');
    }
  });
});

/** A cook run of its own for a test that sends it a temperature log. */
const newRun = async () =>
  runOf(
    await sendAs(supervisor, 'post', '/api/cook-runs', {
      code: uniqueName('CR'),
      cookedOn: '2026-03-02',
      minutesAtPressure: 90,
      container: '1 L jar',
    }),
  );

describe('temperature log numbers out of physical range', () => {
  it('answers 422 naming the line for a 400-digit minute', async () => {
    const run = await newRun();
    const csv = `minute,celsius\n0,100\n${'9'.repeat(400)},121\n`;
    const res = await postCsvAs(supervisor, `/api/cook-runs/${run.id}/readings`, csv);
    expect(res.status).toBe(422);
    expect(errorOf(res).issues![0]!.message).toMatch(/^line 3, minute: must be at most 2880 minutes/);
  });

  it('answers 422 naming the line for a temperature beyond the physical range', async () => {
    const run = await newRun();
    const csv = `minute,celsius\n0,100\n1,1e400\n`;
    const res = await postCsvAs(supervisor, `/api/cook-runs/${run.id}/readings`, csv);
    expect(res.status).toBe(422);
    expect(errorOf(res).issues![0]!.message).toMatch(/^line 3, celsius:/);
  });
});

describe('dates and times', () => {
  const days = (n: number) => new Date(Date.now() + n * 86_400_000);
  const batch = async (inoculatedAt: unknown) => {
    const session = await jarFixtures.session();
    const culture = await jarFixtures.culture();
    return sendAs(supervisor, 'post', '/api/jars/batch', {
      sessionId: session.id,
      count: 1,
      grainId: await jarFixtures.grainId(),
      cultureId: culture.id,
      inoculatedAt,
    });
  };

  it.each([
    ['an impossible calendar date', '2026-11-31T12:00:00Z'],
    ['a boolean', true],
    ['a number', -1],
    ['a time without an offset', '2026-05-04T10:30:00'],
    ['a date alone', '2026-05-04'],
    ['two days ahead', days(2).toISOString()],
  ])('refuses %s as inoculatedAt with 400 naming the field', async (_what, value) => {
    const res = await batch(value);
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('inoculatedAt');
  });

  it('keeps the offset a time was written with', async () => {
    const res = await batch('2026-05-04T10:30:00+02:00');
    expect(res.status).toBe(201);
    expect(new Date(bodyOf(res, jarBatchResultSchema).jars[0]!.inoculatedAt).toISOString()).toBe(
      '2026-05-04T08:30:00.000Z',
    );
  });

  it.each([true, -1, '2026-02-29T08:00:00Z'])('refuses %s as a jar event time', async (at) => {
    const made = await batch('2026-05-04T10:30:00Z');
    const res = await sendAs(supervisor, 'post', `/api/jars/${bodyOf(made, jarBatchResultSchema).jars[0]!.id}/events`, {
      type: 'shaken',
      at,
    });
    expect(res.status).toBe(400);
    expect(errorOf(res).issues![0]).toMatchObject({
      path: 'at',
      message: expect.stringMatching(/^must be a date and time/) as string,
    });
  });

  it.each([
    ['cookedOn', { cookedOn: '2099-01-01' }],
    ['startedAt', { startedAt: days(3).toISOString() }],
  ])('refuses a cook run %s more than a day ahead', async (field, over) => {
    const res = await sendAs(supervisor, 'post', '/api/cook-runs', {
      code: uniqueName('CR'),
      cookedOn: '2026-03-02',
      minutesAtPressure: 90,
      container: '1 L jar',
      ...over,
    });
    expect(res.status).toBe(400);
    expect(errorOf(res).issues![0]).toEqual({ path: field, message: 'cannot be more than a day in the future' });
  });

  it('refuses an imported date more than a day ahead, naming line and column', async () => {
    const tag = uniqueName('FUT');
    const csv =
      'jar_label,grain,cook_run,cook_minutes,inoculated_on,session,operator,culture,outcome,contaminant,found_on\n' +
      `${tag}-1,rye,${tag}-CR,90,2099-01-01,${tag}-S,Invented Person,${tag}-LC,clean,,\n`;
    const res = await postCsvAs(supervisor, '/api/imports/history', csv);
    expect(res.status).toBe(422);
    expect(rejectionOf(res).errors).toEqual([
      { line: 2, column: 'inoculated_on', message: '2099-01-01 is more than a day in the future' },
    ]);
  });
});

describe('multipart bodies that cannot be read', () => {
  const bodies = [
    ['no boundary', 'multipart/form-data', 'whatever'],
    ['a cut-off part', 'multipart/form-data; boundary=x', '--x\r\nContent-Disposition: form-data; name="f"'],
  ] as const;
  const uploads = [
    ['/api/photos', 'photos'],
    ['/api/imports/history', 'file'],
  ] as const;

  for (const [what, type, body] of bodies) {
    it.each(uploads)(`%s answers 400 naming %s for ${what}`, async (url, field) => {
      const res = await admin.agent.post(url).set('X-CSRF-Token', admin.token()).set('Content-Type', type).send(body);
      expect(res.status).toBe(400);
      expect(errorOf(res)).toMatchObject({ code: 'malformed-upload', issues: [{ path: field }] });
    });
  }

  it('a cook run log answers 400 naming file for a body with no boundary', async () => {
    const run = await newRun();
    const res = await supervisor.agent
      .post(`/api/cook-runs/${run.id}/readings`)
      .set('X-CSRF-Token', supervisor.token())
      .set('Content-Type', 'multipart/form-data')
      .send('whatever');
    expect(res.status).toBe(400);
    expect(errorOf(res)).toMatchObject({ code: 'malformed-upload', issues: [{ path: 'file' }] });
  });
});
