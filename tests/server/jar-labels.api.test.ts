import { randomInt } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { Jar } from '../../server/jars/jar.entity';
import { labelsAfter, labelFormatOf } from '../../server/jars/label-sequence';
import { createTestApp } from '../setup/test-app';
import { signedIn, type Client } from '../setup/factories';
import { jarFixtures, makeJars } from './jars.fixtures';

const app = createTestApp();

let tech: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
});

async function batchBody(count: number) {
  const session = await jarFixtures.session();
  const culture = await jarFixtures.culture();
  return { sessionId: session.id, count, grainId: await jarFixtures.grainId(), cultureId: culture.id };
}

/** A stored label as the history import writes it: straight into the register. */
async function storeLabel(label: string) {
  const m = dataSource.manager;
  await m.insert(Jar, {
    label,
    grainId: await jarFixtures.grainId(),
    inoculatedAt: new Date('2026-03-02T12:00:00Z'),
    inoculatedOn: '2026-03-02',
    imported: true,
  });
}

/** Letters only, so a test's labels never share a prefix with another test's. */
const letters = () => Array.from({ length: 4 }, () => String.fromCharCode(65 + randomInt(26))).join('');

describe('label sequence (pure)', () => {
  it('reads prefix and width from a label and counts on exactly past 2^53', () => {
    expect(labelFormatOf('J00005')).toEqual({ prefix: 'J', width: 5 });
    expect(labelFormatOf('J-000120')).toEqual({ prefix: 'J-', width: 6 });
    expect(labelFormatOf('PG-1A2B-00001')).toBeNull();
    expect(labelsAfter({ prefix: 'J', width: 5 }, '00009', 2)).toEqual(['J00010', 'J00011']);
    expect(labelsAfter({ prefix: 'J', width: 5 }, null, 1)).toEqual(['J00001']);
    expect(labelsAfter({ prefix: 'J-', width: 20 }, '99999999999999999999', 2)).toEqual([
      'J-100000000000000000000',
      'J-100000000000000000001',
    ]);
  });
});

describe('POST /api/jars/batch labels', () => {
  it('continues an imported label past 2^53 exactly, batch after batch, without a clash', async () => {
    await storeLabel('J-99999999999999999999');
    const first = await makeJars(tech, await batchBody(3));
    expect(first.map((j) => j.label)).toEqual([
      'J-100000000000000000000',
      'J-100000000000000000001',
      'J-100000000000000000002',
    ]);
    const second = await makeJars(tech, await batchBody(2));
    expect(second.map((j) => j.label)).toEqual(['J-100000000000000000003', 'J-100000000000000000004']);
  });

  it('follows the format of the lab latest labels and continues their highest number', async () => {
    const prefix = letters();
    await storeLabel(`${prefix}00041`);
    await storeLabel(`${prefix}00007`);
    const jars = await makeJars(tech, await batchBody(2));
    expect(jars.map((j) => j.label)).toEqual([`${prefix}00042`, `${prefix}00043`]);
  });
});
