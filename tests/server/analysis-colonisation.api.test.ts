import { beforeAll, describe, expect, it } from 'vitest';
import type { ColonisationDto } from '../../shared/schemas/analysis-colonisation';
import { dataSource } from '../../server/db/data-source';
import { sixMpSurvival, sixMpTimes } from '../shared/stats/six-mp-example';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { grainId, insertIncident, insertJars } from './analysis-rows.fixtures';
import { addDays, clearProduction } from './analysis-planted.fixture';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  await clearProduction();
  reader = await signedIn(app, 'trainer');
});

describe('GET /api/analysis/colonisation', () => {
  // The 6-MP example (six-mp-example.ts) read as days to full colonisation; + marks a jar censored
  // (discarded) on that day.
  const raw = sixMpTimes;
  const start = '2024-02-05';

  beforeAll(async () => {
    const oats = await grainId('oats');
    await insertJars(
      raw.map((t, i) => {
        const day = Number.parseInt(t, 10);
        const censored = t.endsWith('+');
        return {
          label: `PX-KM-${i}`,
          grainId: oats,
          inoculatedOn: start,
          status: censored ? 'discarded' : 'colonised',
          colonisedOn: censored ? null : addDays(start, day),
          endedOn: censored ? addDays(start, day) : null,
        };
      }),
    );
    // A contaminated jar that never colonised is censored on the day it was found.
    const [turned] = await insertJars([
      {
        label: 'PX-KM-X',
        grainId: await grainId('maize'),
        inoculatedOn: start,
        status: 'contaminated',
        endedOn: addDays(start, 4),
      },
    ]);
    await insertIncident([turned!], addDays(start, 4));
  });

  it('reproduces the published product-limit curve and median per grain', async () => {
    const res = await reader.agent.get(`/api/analysis/colonisation?from=${start}&to=${start}`);
    expect(res.status).toBe(200);
    const oats = (res.body as ColonisationDto).curves.find((c) => c.grain === 'oats')!;
    expect(oats).toMatchObject({ jars: 21, colonised: 9, censored: 12, medianDays: 23 });
    const at = (d: number) => oats.steps.find((s) => s.day === d)!.stillColonising;
    for (const [day, survival] of sixMpSurvival) expect(at(day)).toBeCloseTo(survival, 4);
    const maize = (res.body as ColonisationDto).curves.find((c) => c.grain === 'maize')!;
    expect(maize).toMatchObject({ jars: 1, colonised: 0, censored: 1, medianDays: null });
    expect(maize.steps).toEqual([{ day: 4, atRisk: 1, colonised: 0, censored: 1, stillColonising: 1 }]);
  });

  it('leaves imported jars out, contaminated and clean alike (they carry no colonisation day)', async () => {
    const day = '2024-03-04';
    const wheat = await grainId('wheat');
    const ids = await insertJars([
      { label: 'PX-KM-OWN', grainId: wheat, inoculatedOn: day, status: 'colonised', colonisedOn: addDays(day, 12) },
      { label: 'PX-KM-IMP-X', grainId: wheat, inoculatedOn: day, status: 'contaminated', endedOn: addDays(day, 5) },
      { label: 'PX-KM-IMP-C', grainId: wheat, inoculatedOn: day, status: 'colonised' },
    ]);
    await dataSource.query('UPDATE jars SET imported = 1 WHERE id IN (?, ?)', [ids[1], ids[2]]);
    await insertIncident([ids[1]!], addDays(day, 5));
    const res = await reader.agent.get(`/api/analysis/colonisation?from=${day}&to=${day}`);
    const curve = (res.body as ColonisationDto).curves.find((c) => c.grain === 'wheat')!;
    expect(curve).toMatchObject({ jars: 1, colonised: 1, censored: 0, medianDays: 12 });
  });
});
