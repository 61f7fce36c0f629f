import type { EntityManager } from 'typeorm';
import type { JarStatus, ReleasedTo } from '../../shared/enums';
import { numberOrNull } from '../core/raw-values';
import { dataSource } from '../db/data-source';

export interface LineageCultureRaw {
  id: number;
  code: string;
  state: string;
  parentCultureId: number | null;
}

export interface LineageJarRaw {
  id: number;
  label: string;
  status: JarStatus;
  inoculatedOn: Date | string;
  cultureId: number | null;
  parentJarId: number | null;
  endedOn: Date | string | null;
  releasedTo: ReleasedTo | null;
  releasedToWho: string | null;
  releasedOn: Date | string | null;
}

// UNION (not UNION ALL) drops rows already reached, so a cycle typed into parent links still ends.
const culturesBelow = `cs (id) AS (
    SELECT id FROM cultures WHERE id = ?
    UNION
    SELECT c.id FROM cultures c JOIN cs ON c.parentCultureId = cs.id
  )`;
const jarsFromCultures = `js (id) AS (
    SELECT j.id FROM jars j WHERE j.cultureId IN (SELECT id FROM cs)
    UNION
    SELECT j.id FROM jars j JOIN js ON j.parentJarId = js.id
  )`;
const jarsFromJar = `js (id) AS (
    SELECT id FROM jars WHERE id = ?
    UNION
    SELECT j.id FROM jars j JOIN js ON j.parentJarId = js.id
  )`;

const jarColumns = `SELECT j.id, j.label, j.status, j.inoculatedOn, j.cultureId, j.parentJarId, j.endedOn,
         r.releasedTo, r.releasedToWho, r.onDate AS releasedOn
    FROM js JOIN jars j ON j.id = js.id
    LEFT JOIN jar_events r ON r.id = (
      SELECT MAX(e.id) FROM jar_events e WHERE e.jarId = j.id AND e.type = 'released'
    )
   ORDER BY j.label`;

function normaliseJars(rows: LineageJarRaw[]): LineageJarRaw[] {
  return rows.map((r) => ({
    ...r,
    id: Number(r.id),
    cultureId: numberOrNull(r.cultureId),
    parentJarId: numberOrNull(r.parentJarId),
  }));
}

export const lineageRepository = {
  async culturesBelow(cultureId: number, m: EntityManager = dataSource.manager): Promise<LineageCultureRaw[]> {
    const rows: LineageCultureRaw[] = await m.query(
      `WITH RECURSIVE ${culturesBelow}
       SELECT c.id, c.code, c.state, c.parentCultureId FROM cs JOIN cultures c ON c.id = cs.id ORDER BY c.code`,
      [cultureId],
    );
    return rows.map((r) => ({ ...r, id: Number(r.id), parentCultureId: numberOrNull(r.parentCultureId) }));
  },

  async jarsBelowCulture(cultureId: number, m: EntityManager = dataSource.manager): Promise<LineageJarRaw[]> {
    return normaliseJars(
      await m.query(`WITH RECURSIVE ${culturesBelow}, ${jarsFromCultures} ${jarColumns}`, [cultureId]),
    );
  },

  /** The jar itself and every jar made from it, at any depth. */
  async jarsBelowJar(jarId: number, m: EntityManager = dataSource.manager): Promise<LineageJarRaw[]> {
    return normaliseJars(await m.query(`WITH RECURSIVE ${jarsFromJar} ${jarColumns}`, [jarId]));
  },

  /** Locks the rows a hold will change; run inside the hold's transaction. */
  async lockForHold(m: EntityManager, ids: number[]): Promise<{ id: number; label: string; status: JarStatus }[]> {
    if (ids.length === 0) return [];
    const rows: { id: number; label: string; status: JarStatus }[] = await m.query(
      `SELECT id, label, status FROM jars WHERE id IN (${ids.map(() => '?').join(',')}) ORDER BY id FOR UPDATE`,
      ids,
    );
    return rows.map((r) => ({ ...r, id: Number(r.id) }));
  },
};
