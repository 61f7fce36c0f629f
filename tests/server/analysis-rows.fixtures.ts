import { dataSource } from '../../server/db/data-source';
import { rebuildTallies } from '../../server/tallies/tallies.service';

/** Rows written straight to the tables, so each analysis sees exactly the jars a published example holds. */
export async function grainId(name: string): Promise<number> {
  const [row] = await dataSource.query<{ id: number }[]>('SELECT id FROM grains WHERE name = ?', [name]);
  return Number(row!.id);
}

export interface JarSeed {
  label: string;
  grainId: number;
  cookRunId?: number | null;
  inoculatedOn: string;
  status: string;
  colonisedOn?: string | null;
  endedOn?: string | null;
}

export async function insertJars(jars: JarSeed[]): Promise<number[]> {
  const ids: number[] = [];
  for (const j of jars) {
    const res = await dataSource.query<{ insertId: number }>(
      'INSERT INTO jars (label, grainId, cookRunId, status, inoculatedAt, inoculatedOn, colonisedOn, endedOn) VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
      [
        j.label,
        j.grainId,
        j.cookRunId ?? null,
        j.status,
        `${j.inoculatedOn} 12:00:00`,
        j.inoculatedOn,
        j.colonisedOn ?? null,
        j.endedOn ?? null,
      ],
    );
    ids.push(Number(res.insertId));
  }
  // Written beside the jars module, so counted here as the module would.
  await rebuildTallies();
  return ids;
}

export async function insertIncident(
  jarIds: number[],
  foundOn: string,
  opts: { voided?: boolean; verdict?: string } = {},
) {
  const res = await dataSource.query<{ insertId: number }>(
    `INSERT INTO incidents (foundAt, foundOn, foundByName, contaminant, status, verdict, voided, version)
     VALUES (?, ?, 'Test finder', 'bacterial', 'closed', ?, ?, 1)`,
    [`${foundOn} 12:00:00`, foundOn, opts.verdict ?? 'confirmed', opts.voided ? 1 : 0],
  );
  for (const jarId of jarIds)
    await dataSource.query('INSERT INTO incident_jars (incidentId, jarId) VALUES (?, ?)', [res.insertId, jarId]);
  await rebuildTallies();
  return Number(res.insertId);
}

export async function insertCookRun(
  code: string,
  minutes: number,
  extra: {
    gaugeKPa?: number | null;
    altitudeM?: number;
    f0?: number | null;
    f0Source?: string | null;
    container?: string;
    logPlacement?: 'chamber' | 'centre';
  } = {},
) {
  const res = await dataSource.query<{ insertId: number }>(
    'INSERT INTO cook_runs (code, minutesAtPressure, gaugeKPa, altitudeM, f0, f0Source, container, logPlacement) VALUES (?, ?, ?, ?, ?, ?, ?, ?)',
    [
      code,
      minutes,
      extra.gaugeKPa ?? null,
      extra.altitudeM ?? 0,
      extra.f0 ?? null,
      extra.f0Source ?? null,
      extra.container ?? null,
      extra.logPlacement ?? null,
    ],
  );
  return Number(res.insertId);
}
