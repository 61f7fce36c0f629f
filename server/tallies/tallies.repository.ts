import type { EntityManager } from 'typeorm';
import {
  comboKeyList,
  detectionKeyList,
  jarKeysSql,
  levelRollupSql,
  tallyKeyList,
  tallyLevelFactors,
  type JarChoice,
} from './jar-keys.sql';
import { colonisationKeyList, colonisationKeysSql, colonisationRollupSql } from './colonisation-keys.sql';

/** The jars' colonisation rows as last counted, added to tally_colonisation with `sign`. */
const addColonisationLedger = (m: EntityManager, sign: 1 | -1, jars: JarChoice) =>
  m.query(
    `INSERT INTO tally_colonisation (${colonisationKeyList}, jars) ${colonisationRollupSql(sign, jars.on('jarId'))}
      ON DUPLICATE KEY UPDATE jars = jars + VALUES(jars)`,
    jars.params,
  );

/** The jars' rows as last counted, summed per key and added to tally_counts, tally_detections and tally_levels with `sign`. */
async function addLedgerToCounts(m: EntityManager, sign: 1 | -1, jars: JarChoice) {
  await m.query(
    `INSERT INTO tally_levels (factor, inoculatedOn, levelId, room, jars, contaminated)
      ${levelRollupSql(sign, jars.on('jarId'))}
      ON DUPLICATE KEY UPDATE jars = jars + VALUES(jars), contaminated = contaminated + VALUES(contaminated)`,
    tallyLevelFactors.flatMap(() => jars.params),
  );
  await m.query(
    `INSERT INTO tally_counts (${comboKeyList}, jars, contaminated)
      SELECT ${comboKeyList}, ${sign} * COUNT(*), ${sign} * SUM(contaminated) FROM tallied_jars WHERE ${jars.on('jarId')}
      GROUP BY ${comboKeyList} ORDER BY ${comboKeyList}
      ON DUPLICATE KEY UPDATE jars = jars + VALUES(jars), contaminated = contaminated + VALUES(contaminated)`,
    jars.params,
  );
  await m.query(
    `INSERT INTO tally_detections (${detectionKeyList}, jars)
      SELECT ${detectionKeyList}, ${sign} * COUNT(*) FROM tallied_jars
      WHERE contaminated = 1 AND ${jars.on('jarId')}
      GROUP BY ${detectionKeyList} ORDER BY ${detectionKeyList}
      ON DUPLICATE KEY UPDATE jars = jars + VALUES(jars)`,
    jars.params,
  );
}

export const talliesRepository = {
  /** Waits for any other recount to commit; held until this transaction ends. */
  lock: (m: EntityManager) =>
    m.query(`INSERT INTO tally_state (id, rebuiltAt) VALUES (1, NULL) ON DUPLICATE KEY UPDATE id = id`),

  /** Takes the jars out of the counts and forgets how they were counted. */
  async forget(m: EntityManager, jars: JarChoice) {
    await addLedgerToCounts(m, -1, jars);
    await m.query(`DELETE FROM tallied_jars WHERE ${jars.on('jarId')}`, jars.params);
    await addColonisationLedger(m, -1, jars);
    await m.query(`DELETE FROM tallied_colonisation WHERE ${jars.on('jarId')}`, jars.params);
  },

  /** Reads the jars' keys afresh (a locking read: committed changes of others are seen) and counts them. */
  async count(m: EntityManager, jars: JarChoice, windowDays: number) {
    const keys = jarKeysSql(windowDays, jars);
    await m.query(`INSERT INTO tallied_jars (jarId, ${tallyKeyList}) ${keys.sql}`, keys.params);
    await addLedgerToCounts(m, 1, jars);
    const colonisation = colonisationKeysSql(jars);
    await m.query(
      `INSERT INTO tallied_colonisation (jarId, ${colonisationKeyList}) ${colonisation.sql}`,
      colonisation.params,
    );
    await addColonisationLedger(m, 1, jars);
  },

  /** A rebuild starts from nothing, so no row is left at zero. */
  clear: async (m: EntityManager) => {
    await m.query('DELETE FROM tally_counts');
    await m.query('DELETE FROM tally_detections');
    await m.query('DELETE FROM tally_levels');
    await m.query('DELETE FROM tallied_jars');
    await m.query('DELETE FROM tally_colonisation');
    await m.query('DELETE FROM tallied_colonisation');
  },

  /** Jars that have moved: the only ones whose room in the counts depends on the observation window. */
  movedJarIds: async (m: EntityManager) =>
    (await m.query<{ jarId: number }[]>("SELECT DISTINCT jarId FROM jar_events WHERE type = 'moved'")).map((r) =>
      Number(r.jarId),
    ),

  markRebuilt: (m: EntityManager) => m.query('UPDATE tally_state SET rebuiltAt = NOW() WHERE id = 1'),
};
