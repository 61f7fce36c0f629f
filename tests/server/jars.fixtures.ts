import { dataSource } from '../../server/db/data-source';
import { CookRun } from '../../server/cook-runs/cook-run.entity';
import { Culture } from '../../server/cultures/culture.entity';
import { GrainLot } from '../../server/grain/grain-lot.entity';
import { Grain } from '../../server/grain/grain.entity';
import { PrepBatch } from '../../server/grain/prep-batch.entity';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import type { CultureState } from '../../shared/enums';
import { jarStorySchema } from '../../shared/schemas/jar-story';
import { jarBatchResultSchema, jarRowSchema } from '../../shared/schemas/jars';
import { bodyOf } from '../setup/bodies';
import type { Agent } from '../setup/test-app';
import { uniqueName } from '../setup/factories';

/** Invented production records for jar tests, written straight to the tables the other registers own. */
export const jarFixtures = {
  async grainId(name = 'rye'): Promise<number> {
    const g = await dataSource.manager.findOneByOrFail(Grain, { name });
    return g.id;
  },

  async prepBatch(grainName = 'rye') {
    const m = dataSource.manager;
    const lot = await m.save(
      m.create(GrainLot, {
        grainId: await this.grainId(grainName),
        supplierLotCode: uniqueName('LOT'),
        receivedOn: '2026-05-01',
      }),
    );
    return m.save(
      m.create(PrepBatch, {
        code: uniqueName('PB'),
        grainLotId: lot.id,
        preparedOn: '2026-05-03',
        soakHours: 18,
        simmerMinutes: 12,
        drainMinutes: 45,
      }),
    );
  },

  cookRun: () =>
    dataSource.manager.save(
      dataSource.manager.create(CookRun, {
        code: uniqueName('CR'),
        minutesAtPressure: 90,
        gaugeKPa: 103,
        container: '1 L jar',
        cookedOn: '2026-05-03',
        startedAt: new Date('2026-05-03T09:00:00Z'),
      }),
    ),

  culture: (state: CultureState = 'released', parentCultureId: number | null = null) =>
    dataSource.manager.save(
      dataSource.manager.create(Culture, {
        code: uniqueName('LC'),
        species: 'Pleurotus ostreatus',
        strain: 'invented grey',
        state,
        parentCultureId,
        preparedOn: '2026-04-20',
      }),
    ),

  session: (heldOn = '2026-05-04') =>
    dataSource.manager.save(
      dataSource.manager.create(InoculationSession, {
        code: uniqueName('S'),
        heldOn,
        startedAt: new Date(`${heldOn}T10:00:00Z`),
        operatorName: 'Test operator',
        workspace: 'flow-hood',
      }),
    ),
};

export interface JarRow {
  id: number;
  label: string;
  status: string;
  shelfPosition: number | null;
  [key: string]: unknown;
}

/** Makes jars through the API, as a technician at the bench would. */
export async function makeJars(
  client: { agent: Agent; token: () => string },
  body: Record<string, unknown>,
): Promise<JarRow[]> {
  const res = await client.agent.post('/api/jars/batch').set('X-CSRF-Token', client.token()).send(body);
  if (res.status !== 201) throw new Error(`batch failed: ${res.status} ${JSON.stringify(res.body)}`);
  return bodyOf(res, jarBatchResultSchema).jars;
}

/** A jar row, as the event route answers it. */
export const jarRowOf = (res: { body: unknown }) => bodyOf(res, jarRowSchema);

/** A jar's whole story, as its page reads it. */
export const storyOf = (res: { body: unknown }) => bodyOf(res, jarStorySchema);

export function jarEvent(client: { agent: Agent; token: () => string }, jarId: number, body: Record<string, unknown>) {
  return client.agent.post(`/api/jars/${jarId}/events`).set('X-CSRF-Token', client.token()).send(body);
}

// BigInt: another file in this worker may have left a label past 2^53.
export const labelNumber = (label: string) => BigInt(/[0-9]+$/.exec(label)?.[0] ?? '0');
export const labelPrefix = (label: string) => label.replace(/[0-9]+$/, '');

/** A batch of three rye jars in a fresh session from a fresh culture; overrides change any field. */
export async function batchBody(overrides: Record<string, unknown> = {}) {
  const session = await jarFixtures.session();
  const culture = await jarFixtures.culture();
  return {
    sessionId: session.id,
    count: 3,
    grainId: await jarFixtures.grainId(),
    cultureId: culture.id,
    inoculatedAt: '2026-05-04T10:30:00Z',
    ...overrides,
  };
}
