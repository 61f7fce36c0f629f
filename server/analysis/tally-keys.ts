import type { TallyLevelFactor } from '../tallies/jar-keys.sql';

/**
 * What the analysis groups on: a column of the counts (server/tallies), written with `@` for the table's
 * alias so one key reads tally_counts (`t`) and a jar's own row in tallied_jars (`tj`) alike. Where a jar
 * is counted — the root culture of its lineage, its transfers, the room it stood in when found or at the
 * end of its window (DESIGN.md §3) — is settled when it is counted, in server/tallies/jar-keys.sql.ts.
 * A key the jar does not record is stored as 0 or '' and read back as NULL.
 */
export type JarKey = string;

export const keyOn = (key: JarKey, alias: string) => key.replaceAll('@.', `${alias}.`);

export const grainKey: JarKey = '@.grainId';
export const cookRunKey: JarKey = 'NULLIF(@.cookRunId, 0)';
export const sessionKey: JarKey = 'NULLIF(@.sessionId, 0)';
export const cultureKey: JarKey = 'NULLIF(@.cultureId, 0)';
export const prepBatchKey: JarKey = 'NULLIF(@.prepBatchId, 0)';
export const roomKey: JarKey = "NULLIF(@.room, '')";
export const transfersKey: JarKey = '@.transfers';
export const dayKey: JarKey = '@.inoculatedOn';
export const yearWeekKey: JarKey = 'YEARWEEK(@.inoculatedOn, 3)';

/**
 * The bare column behind a key whose missing value (0 or '') reads as NULL. Matched against a level (an id
 * joined to its table, a room named), the two find the same rows, since no id is 0 and no level is empty;
 * only the bare column can use an index.
 */
const bareColumns: ReadonlyMap<JarKey, JarKey> = new Map([
  [cookRunKey, '@.cookRunId'],
  [sessionKey, '@.sessionId'],
  [cultureKey, '@.cultureId'],
  [prepBatchKey, '@.prepBatchId'],
  [roomKey, '@.room'],
]);
export const bareColumnOf = (key: JarKey): JarKey => bareColumns.get(key) ?? key;

/** Keys read off the inoculation day: the same in both tables. */
export const dayKeys: ReadonlySet<JarKey> = new Set([dayKey, yearWeekKey]);

/**
 * A key's factor in tally_levels (the counts rolled up per day and one factor), and the key there. Every
 * jar has a grain, so the grain rows also answer questions about days alone.
 */
export const levelKeys: ReadonlyMap<JarKey, { factor: TallyLevelFactor; key: JarKey }> = new Map([
  [grainKey, { factor: 'grain', key: '@.levelId' }],
  [cookRunKey, { factor: 'cookRun', key: 'NULLIF(@.levelId, 0)' }],
  [sessionKey, { factor: 'session', key: 'NULLIF(@.levelId, 0)' }],
  [cultureKey, { factor: 'culture', key: 'NULLIF(@.levelId, 0)' }],
  [prepBatchKey, { factor: 'prepBatch', key: 'NULLIF(@.levelId, 0)' }],
  [roomKey, { factor: 'room', key: "NULLIF(@.room, '')" }],
  [transfersKey, { factor: 'transfers', key: '@.levelId' }],
]);

/** `0`, `1`, `2+`: the level names of the transfers factor. */
export const transfersLevelSql = (ref: string) =>
  `CASE WHEN ${ref} IS NULL THEN NULL WHEN ${ref} >= 2 THEN '2+' ELSE CAST(${ref} AS CHAR) END`;
