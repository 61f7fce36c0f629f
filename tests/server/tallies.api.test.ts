import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { rebuildTallies, recountJars } from '../../server/tallies/tallies.service';
import { setParentJar } from '../../server/jars/jar-details.service';
import { comboKeyList, detectionKeyList, tallyKeyList } from '../../server/tallies/jar-keys.sql';
import { colonisationKeyList } from '../../server/tallies/colonisation-keys.sql';
import { contaminants } from '../../shared/enums';
import { createTestApp } from '../setup/test-app';
import { bodyOf } from '../setup/bodies';
import { labSettingsSchema } from '../../shared/schemas/settings';
import { signedIn, type Client } from '../setup/factories';
import { csv, importingSupervisor, row } from './imports.fixtures';
import { batchBody, jarEvent, jarFixtures, makeJars, type JarRow } from './jars.fixtures';
import { send } from './incidents-review.fixtures';

const app = createTestApp();
const dayMs = 86_400_000;

/** A fixed-seed generator (mulberry32), so the mix is the same on every run and a failure repeats. */
function random(seed: number) {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** The counts as rows with jars, in key order: zero rows are left by moves and carry nothing. */
const counts = () =>
  dataSource.query<Record<string, unknown>[]>(
    `SELECT ${comboKeyList}, SUM(jars) AS jars, SUM(contaminated) AS contaminated FROM tally_counts
      GROUP BY ${comboKeyList} HAVING SUM(jars) <> 0 ORDER BY ${comboKeyList}`,
  );
const detections = () =>
  dataSource.query<Record<string, unknown>[]>(
    `SELECT ${detectionKeyList}, SUM(jars) AS jars FROM tally_detections
      GROUP BY ${detectionKeyList} HAVING SUM(jars) <> 0 ORDER BY ${detectionKeyList}`,
  );
const levels = () =>
  dataSource.query<Record<string, unknown>[]>(
    `SELECT factor, inoculatedOn, levelId, room, SUM(jars) AS jars, SUM(contaminated) AS contaminated FROM tally_levels
      GROUP BY factor, inoculatedOn, levelId, room HAVING SUM(jars) <> 0 ORDER BY factor, inoculatedOn, levelId, room`,
  );
const colonisation = () =>
  dataSource.query<Record<string, unknown>[]>(
    `SELECT ${colonisationKeyList}, SUM(jars) AS jars FROM tally_colonisation
      GROUP BY ${colonisationKeyList} HAVING SUM(jars) <> 0 ORDER BY ${colonisationKeyList}`,
  );
const colonisationLedger = () =>
  dataSource.query<Record<string, unknown>[]>(
    `SELECT jarId, ${colonisationKeyList} FROM tallied_colonisation ORDER BY jarId`,
  );
const ledger = () =>
  dataSource.query<Record<string, unknown>[]>(`SELECT jarId, ${tallyKeyList} FROM tallied_jars ORDER BY jarId`);

interface LiveIncident {
  id: number;
  version: number;
  jarIds: number[];
}

describe('the analysis counts kept with every write', () => {
  let tech: Client;
  let sup: Client;
  let admin: Client;
  let windowBefore: number;
  beforeAll(async () => {
    tech = await signedIn(app, 'technician');
    sup = await signedIn(app, 'supervisor');
    admin = await signedIn(app, 'admin');
    // Other files in this database write rows beside the app (fixtures); start from counts that hold.
    await rebuildTallies();
    const settings = await admin.agent.get('/api/settings');
    windowBefore = bodyOf(settings, labSettingsSchema).observationWindowDays;
  });
  // The mix changes the observation window; the files that run after this one in its database expect theirs.
  afterAll(async () => {
    const res = await send(admin, 'patch', '/api/settings', { observationWindowDays: windowBefore });
    if (res.status !== 200) throw new Error(`restoring the window answered ${res.status}`);
  });

  it('equal a rebuild from the records after a random mix of jars, moves, incidents, reviews, voids, imports and ends', async () => {
    const next = random(20261203);
    const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)]!;
    const rooms = ['Incubation A', 'Incubation B', 'Quarantine'];
    const grains = [await jarFixtures.grainId('rye'), await jarFixtures.grainId('millet')];
    const cultures = [await jarFixtures.culture(), await jarFixtures.culture()];
    const batches = [await jarFixtures.prepBatch('rye'), await jarFixtures.prepBatch('millet')];
    const cookRuns = [await jarFixtures.cookRun(), await jarFixtures.cookRun()];
    const jars: (JarRow & { inoculatedAt: number })[] = [];
    const incidents: LiveIncident[] = [];
    const done = { batch: 0, move: 0, flag: 0, edit: 0, review: 0, void: 0, import: 0, life: 0, window: 0 };
    const afterWindow = { ...done };

    const makeBatch = async () => {
      const daysAgo = 1 + Math.floor(next() * 45);
      const inoculatedAt = Date.now() - daysAgo * dayMs;
      const session = await jarFixtures.session(new Date(inoculatedAt).toISOString().slice(0, 10));
      const parent = jars.length > 0 && next() < 0.3 ? pick(jars) : null;
      const g = Math.floor(next() * grains.length);
      const body = {
        sessionId: session.id,
        count: 1 + Math.floor(next() * 4),
        grainId: grains[g],
        prepBatchId: next() < 0.5 ? batches[g]!.id : undefined,
        cookRunId: next() < 0.8 ? pick(cookRuns).id : undefined,
        ...(next() < 0.9 ? { room: pick(rooms), shelf: 'S1' } : {}),
        inoculatedAt: new Date(inoculatedAt).toISOString(),
      };
      const culture = { ...body, cultureId: pick(cultures).id };
      // A parent jar that is younger or has since been flagged is refused as inoculum: use a culture then.
      const fromParent =
        parent && parent.inoculatedAt < inoculatedAt
          ? await send(tech, 'post', '/api/jars/batch', { ...body, parentJarId: parent.id })
          : null;
      const made =
        fromParent?.status === 201 ? (fromParent.body as { jars: JarRow[] }).jars : await makeJars(tech, culture);
      jars.push(...made.map((j) => ({ ...j, inoculatedAt })));
      done.batch += 1;
    };
    const move = async () => {
      const jar = pick(jars);
      const res = await jarEvent(tech, jar.id, { type: 'moved', room: pick(rooms), shelf: 'S2' });
      if (res.status === 201 || res.status === 200) done.move += 1;
    };
    const flag = async () => {
      const chosen = [...new Set([pick(jars), pick(jars)])];
      const latest = Math.max(...chosen.map((j) => j.inoculatedAt));
      const foundAt = new Date(latest + next() * (Date.now() - latest));
      const res = await send(tech, 'post', '/api/incidents', {
        jarLabels: chosen.map((j) => j.label),
        contaminant: pick(contaminants),
        severity: 'medium',
        stage: 'incubation',
        sealed: true,
        sterilisedBeforeDisposal: false,
        foundAt: foundAt.toISOString(),
      });
      expect({ status: res.status, body: res.body as unknown }).toMatchObject({ status: 201 });
      const body = res.body as { id: number; version: number };
      incidents.push({ id: body.id, version: body.version, jarIds: chosen.map((j) => j.id) });
      done.flag += 1;
    };
    const edit = async () => {
      const incident = pick(incidents);
      const jarsOf = jars.filter((j) => incident.jarIds.includes(j.id));
      const latest = Math.max(...jarsOf.map((j) => j.inoculatedAt));
      const res = await send(sup, 'patch', `/api/incidents/${incident.id}`, {
        version: incident.version,
        contaminant: pick(contaminants),
        foundAt: new Date(latest + next() * (Date.now() - latest)).toISOString(),
        reason: 'looked again',
      });
      expect({ status: res.status, body: res.body as unknown }).toMatchObject({ status: 200 });
      incident.version = (res.body as { version: number }).version;
      done.edit += 1;
    };
    const review = async () => {
      const incident = pick(incidents);
      const res = await send(sup, 'post', `/api/incidents/${incident.id}/review`, {
        verdict: pick(['ruled-out', 'confirmed'] as const),
      });
      expect({ status: res.status, body: res.body as unknown }).toMatchObject({ status: 200 });
      incident.version = (res.body as { version: number }).version;
      done.review += 1;
    };
    const voidOne = async () => {
      const incident = incidents.shift();
      if (!incident) return;
      const res = await send(sup, 'post', `/api/incidents/${incident.id}/void`, {
        version: incident.version,
        reason: 'filed against the wrong jar',
      });
      expect({ status: res.status, body: res.body as unknown }).toMatchObject({ status: 200 });
      done.void += 1;
    };
    const importSome = async () => {
      const tag = `TQ${done.import}`;
      const rows = [0, 1, 2].map((n) =>
        row(tag, n, n === 1 ? { outcome: 'contaminated', contaminant: 'trichoderma', found_on: '2026-03-09' } : {}),
      );
      const res = await (await importingSupervisor(app)).post(csv(rows));
      expect({ status: res.status, body: res.body as unknown }).toMatchObject({ status: 200 });
      done.import += 1;
    };
    // Colonised, discarded or released: how the jar's colonisation time ends. Refusals (an ended jar, a
    // contaminated one) write nothing and are not counted.
    const life = async () => {
      const jar = pick(jars);
      const kind = pick(['colonised', 'colonised', 'discarded', 'released'] as const);
      const body =
        kind === 'discarded'
          ? { type: kind, reason: 'cracked lid' }
          : kind === 'released'
            ? { type: kind, releasedTo: 'grow-room' }
            : { type: kind };
      const res = await jarEvent(tech, jar.id, body);
      if (res.status === 201 || res.status === 200) done.life += 1;
    };
    const changeWindow = async () => {
      const res = await send(admin, 'patch', '/api/settings', { observationWindowDays: pick([14, 21, 28]) });
      expect({ status: res.status, body: res.body as unknown }).toMatchObject({ status: 200 });
      done.window += 1;
    };

    for (let i = 0; i < 4; i += 1) await makeBatch();
    const steps: [number, () => Promise<void>][] = [
      [0.22, makeBatch],
      [0.16, move],
      [0.18, flag],
      [0.1, life],
      [0.08, edit],
      [0.1, review],
      [0.07, voidOne],
      [0.09, importSome],
    ];
    for (let i = 0; i < 150; i += 1) {
      let r = next();
      let step = steps[0]![1];
      for (const [weight, fn] of steps) {
        if (r < weight) {
          step = fn;
          break;
        }
        r -= weight;
      }
      if ((step === edit || step === review) && incidents.length === 0) step = flag;
      await step();
      // A change of window recounts the jars that moved; once, early, with most writes after it.
      if (i === 30) {
        await changeWindow();
        Object.assign(afterWindow, done);
      }
    }
    // Every kind of write took part after the change of window.
    const rare = Object.entries(done).filter(
      ([kind, n]) => kind !== 'window' && n - afterWindow[kind as keyof typeof done] < 3,
    );
    expect(rare).toEqual([]);

    const kept = await counts();
    const keptLedger = await ledger();
    const keptLevels = await levels();
    const keptDetections = await detections();
    const keptColonisation = await colonisation();
    const keptColonisationLedger = await colonisationLedger();
    expect(new Set(keptColonisationLedger.map((r) => r.ending))).toEqual(new Set(['colonised', 'ended', 'open']));
    expect(kept.some((r) => Number(r.contaminated) > 0)).toBe(true);
    expect(keptDetections.length).toBeGreaterThan(0);
    expect(kept.some((r) => Number(r.transfers) > 0)).toBe(true);
    await rebuildTallies();
    expect(kept).toEqual(await counts());
    expect(keptLedger).toEqual(await ledger());
    expect(keptLevels).toEqual(await levels());
    expect(keptDetections).toEqual(await detections());
    expect(keptColonisation).toEqual(await colonisation());
    expect(keptColonisationLedger).toEqual(await colonisationLedger());
  });

  it('count the jars made from a re-parented jar again, with their new root culture and transfers', async () => {
    const [first, second] = [await jarFixtures.culture(), await jarFixtures.culture()];
    const [top] = await makeJars(tech, await batchBody({ count: 1, cultureId: second.id }));
    const [middle] = await makeJars(tech, await batchBody({ count: 1, cultureId: first.id }));
    const [child] = await makeJars(
      tech,
      await batchBody({
        count: 1,
        cultureId: undefined,
        parentJarId: middle!.id,
        inoculatedAt: '2026-05-06T10:30:00Z',
      }),
    );
    const childRow = async () =>
      (
        await dataSource.query<{ cultureId: number; transfers: number }[]>(
          'SELECT cultureId, transfers FROM tallied_jars WHERE jarId = ?',
          [child!.id],
        )
      )[0];
    expect(await childRow()).toMatchObject({ cultureId: first.id, transfers: 1 });
    await dataSource.transaction((m) => setParentJar(m, middle!.id, top!.id));
    expect(await childRow()).toMatchObject({ cultureId: second.id, transfers: 2 });
    const kept = await ledger();
    await rebuildTallies();
    expect(kept).toEqual(await ledger());
  });

  it('roll back with the write they belong to', async () => {
    const before = await counts();
    const grainId = await jarFixtures.grainId();
    const failed = dataSource.transaction(async (m) => {
      const made = await m.query<{ insertId: number }>(
        "INSERT INTO jars (label, grainId, status, inoculatedAt, inoculatedOn) VALUES ('TQ-ROLLBACK', ?, 'incubating', NOW(), CURDATE())",
        [grainId],
      );
      await recountJars(m, [Number(made.insertId)]);
      const [inside] = await m.query<{ n: string }[]>('SELECT COUNT(*) AS n FROM tallied_jars WHERE jarId = ?', [
        made.insertId,
      ]);
      expect(Number(inside?.n)).toBe(1);
      throw new Error('the write fails after its recount');
    });
    await expect(failed).rejects.toThrow('the write fails after its recount');
    expect(await counts()).toEqual(before);
  });
});
