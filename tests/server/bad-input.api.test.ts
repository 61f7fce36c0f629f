import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { postCsvAs, sendAs, signedIn, uniqueName, type Client } from '../setup/factories';

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
      expect(res.body.error.issues[0].path).toBe('sort');
    }
  });
});

describe('temperature log numbers out of physical range', () => {
  const newRun = async () =>
    (
      await sendAs(supervisor, 'post', '/api/cook-runs', {
        code: uniqueName('CR'),
        cookedOn: '2026-03-02',
        minutesAtPressure: 90,
        container: '1 L jar',
      })
    ).body as { id: number };

  it('answers 422 naming the line for a 400-digit minute', async () => {
    const run = await newRun();
    const csv = `minute,celsius\n0,100\n${'9'.repeat(400)},121\n`;
    const res = await postCsvAs(supervisor, `/api/cook-runs/${run.id}/readings`, csv);
    expect(res.status).toBe(422);
    expect(res.body.error.issues[0].message).toMatch(/^line 3, minute: must be at most 2880 minutes/);
  });

  it('answers 422 naming the line for a temperature beyond the physical range', async () => {
    const run = await newRun();
    const csv = `minute,celsius\n0,100\n1,1e400\n`;
    const res = await postCsvAs(supervisor, `/api/cook-runs/${run.id}/readings`, csv);
    expect(res.status).toBe(422);
    expect(res.body.error.issues[0].message).toMatch(/^line 3, celsius:/);
  });
});
