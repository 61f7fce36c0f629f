/**
 * Invented production for the bench, written with one INSERT … SELECT per table (never row by row):
 * jars, incidents and the registers around them, each row's attributes following from its number.
 */
import type mysql from 'mysql2/promise';

export const JARS_PER_SESSION = 40;
const JARS_PER_COOK_RUN = 60;
const JARS_PER_PREP_BATCH = 300;
const SESSIONS_PER_DAY = 10;
const CULTURES = 40;
/** Training records and sent mail grow with the lab too, though far slower than its jars. */
const JARS_PER_RECORD = 50;
const GRAIN_LOTS = 500;

const digits =
  '(SELECT 0 d UNION ALL SELECT 1 UNION ALL SELECT 2 UNION ALL SELECT 3 UNION ALL SELECT 4 UNION ALL SELECT 5 UNION ALL SELECT 6 UNION ALL SELECT 7 UNION ALL SELECT 8 UNION ALL SELECT 9)';

/**
 * 0 … limit − 1 from cross-joined digit sets: no recursion limit, one statement per table. The leading
 * digit is cut to what the limit needs, so 2,000,000 crosses 2 × 10^6 rows, not 10^7.
 */
export function numbers(limit: number): string {
  const width = Math.max(1, Math.ceil(Math.log10(Math.max(limit, 2))));
  const top = Math.floor((limit - 1) / 10 ** (width - 1));
  const terms = Array.from({ length: width }, (_, i) => `${10 ** i} * d${i}.d`).join(' + ');
  const sets = Array.from({ length: width }, (_, i) => `${digits} d${i}`).join(', ');
  return `(SELECT ${terms} AS n FROM ${sets} WHERE d${width - 1}.d <= ${top}) nums WHERE n < ${limit}`;
}

export async function seed(conn: mysql.Connection, today: string, jars: number, incidents: number) {
  const sessions = Math.ceil(jars / JARS_PER_SESSION);
  const cookRuns = Math.ceil(jars / JARS_PER_COOK_RUN);
  const prepBatches = Math.ceil(jars / JARS_PER_PREP_BATCH);
  const records = Math.ceil(jars / JARS_PER_RECORD);
  await conn.query(
    `INSERT INTO cultures (code, state, preparedOn) SELECT CONCAT('BLC-', LPAD(n, 3, '0')), 'released', DATE_SUB(?, INTERVAL n DAY) FROM ${numbers(CULTURES)}`,
    [today],
  );
  await conn.query(
    `INSERT INTO cook_runs (code, minutesAtPressure, gaugeKPa, altitudeM, cookedOn)
     SELECT CONCAT('BCR-', LPAD(n, 6, '0')), ELT(1 + n MOD 7, 45, 60, 90, 90, 90, 120, 150), 103.4, 0,
            DATE_SUB(?, INTERVAL FLOOR(n * ${JARS_PER_COOK_RUN} / ${JARS_PER_SESSION} / ${SESSIONS_PER_DAY}) + 1 DAY)
     FROM ${numbers(cookRuns)}`,
    [today],
  );
  await conn.query(
    `INSERT INTO inoculation_sessions (code, heldOn, operatorName, workspace)
     SELECT CONCAT('BS-', LPAD(n, 6, '0')), DATE_SUB(?, INTERVAL n DIV ${SESSIONS_PER_DAY} DAY),
            ELT(1 + n MOD 12, 'Ines Marlow', 'Tobin Reyes', 'Uma Castell', 'Viggo Lantz', 'Wren Odell', 'Yara Pell',
                'Zeno Hart', 'Alba Quist', 'Bo Ferrand', 'Cato Wilde', 'Dana Koss', 'Eli Varga'),
            ELT(1 + n MOD 3, 'still-air-box', 'flow-hood', 'open-bench')
     FROM ${numbers(sessions)}`,
    [today],
  );
  await conn.query(
    `INSERT INTO grain_lots (grainId, supplierLotCode, receivedOn)
     SELECT 1 + n MOD 7, CONCAT('BGL-', LPAD(n, 5, '0')), DATE_SUB(?, INTERVAL n DAY) FROM ${numbers(GRAIN_LOTS)}`,
    [today],
  );
  await conn.query(
    `INSERT INTO prep_batches (code, grainLotId, preparedOn)
     SELECT CONCAT('BPB-', LPAD(n, 5, '0')), 1 + n MOD ${GRAIN_LOTS}, DATE_SUB(?, INTERVAL n DIV 10 DAY) FROM ${numbers(prepBatches)}`,
    [today],
  );
  // Ids start at 1 in the fresh tables, so each jar's attributes follow from its number n. A jar colonises 9 to
  // 16 days after inoculation, so the youngest are still incubating.
  const inoculatedOn = `DATE_SUB(?, INTERVAL n DIV ${JARS_PER_SESSION * SESSIONS_PER_DAY} DAY)`;
  const colonisedOn = `DATE_ADD(${inoculatedOn}, INTERVAL 9 + n MOD 8 DAY)`;
  await conn.query(
    `INSERT INTO jars (label, grainId, prepBatchId, cookRunId, sessionId, cultureId, room, shelf, status, colonisedOn, inoculatedAt, inoculatedOn, imported)
     SELECT CONCAT('BJ-', LPAD(n, 7, '0')), 1 + (n DIV ${JARS_PER_COOK_RUN}) MOD 7, 1 + n DIV ${JARS_PER_PREP_BATCH},
            1 + n DIV ${JARS_PER_COOK_RUN}, 1 + n DIV ${JARS_PER_SESSION}, 1 + (n DIV ${JARS_PER_SESSION} + n MOD 2) MOD ${CULTURES},
            ELT(1 + (n DIV ${JARS_PER_SESSION}) MOD 4, 'Room A', 'Room B', 'Room C', 'Room D'), CONCAT('S', n MOD 20),
            IF(${colonisedOn} <= ?, 'colonised', 'incubating'), IF(${colonisedOn} <= ?, ${colonisedOn}, NULL),
            TIMESTAMP(${inoculatedOn}, '12:00:00'), ${inoculatedOn}, 0
     FROM ${numbers(jars)}`,
    [today, today, today, today, today, today, today],
  );
  const step = Math.floor(jars / incidents);
  await conn.query(
    `INSERT INTO incidents (foundAt, foundOn, foundByName, contaminant, status, verdict, imported, version)
     SELECT TIMESTAMP(DATE_ADD(j.inoculatedOn, INTERVAL 3 + j.id MOD 11 DAY), '12:00:00'),
            DATE_ADD(j.inoculatedOn, INTERVAL 3 + j.id MOD 11 DAY), 'Bench finder',
            ELT(1 + j.id MOD 9, 'bacterial', 'trichoderma', 'penicillium', 'aspergillus', 'pin-mould', 'neurospora', 'cobweb', 'yeast', 'unknown'),
            'closed', 'confirmed', 1, 1
     FROM jars j WHERE j.id MOD ${step} = 1 ORDER BY j.id LIMIT ${incidents}`,
  );
  await conn.query(
    `INSERT INTO incident_jars (incidentId, jarId)
     SELECT (j.id - 1) DIV ${step} + 1, j.id FROM jars j WHERE j.id MOD ${step} = 1 ORDER BY j.id LIMIT ${incidents}`,
  );
  await conn.query(`UPDATE jars j JOIN incident_jars ij ON ij.jarId = j.id SET j.status = 'contaminated'`);
  await conn.query(`INSERT INTO procedures (code, title) VALUES ('BP-1', 'Bench inoculation procedure')`);
  await conn.query(
    `INSERT INTO procedure_versions (procedureId, version, title) VALUES (1, 1, 'Bench inoculation procedure')`,
  );
  await conn.query(
    `INSERT INTO training_records (personName, procedureVersionId, trainerName, trainedOn)
     SELECT CONCAT('Bench trainee ', LPAD(n, 6, '0')), 1, 'Bench trainer', DATE_SUB(?, INTERVAL n DIV 20 DAY)
     FROM ${numbers(records)}`,
    [today],
  );
  await conn.query(
    `INSERT INTO sent_mails (kind, toAddress, subject, textBody, status, createdAt)
     SELECT ELT(1 + n MOD 4, 'new-incident', 'cluster-alert', 'retraining', 'weekly-digest'),
            CONCAT('reader', n MOD 30, '@lab.invalid'), CONCAT('Bench message ', n), 'Invented bench message.',
            IF(n MOD 50 = 0, 'failed', 'sent'), TIMESTAMP(DATE_SUB(?, INTERVAL n DIV 40 DAY), '08:00:00')
     FROM ${numbers(records)}`,
    [today],
  );
  for (const t of [
    'jars',
    'incidents',
    'incident_jars',
    'cook_runs',
    'inoculation_sessions',
    'cultures',
    'prep_batches',
    'grain_lots',
    'training_records',
    'sent_mails',
  ]) {
    await conn.query(`ANALYZE TABLE \`${t}\``);
  }
}
