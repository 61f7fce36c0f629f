import { describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { foreignKeys } from '../../server/db/migrations/1796284724480-ForeignKeys';
import { assertNoOrphans, findOrphans } from '../../server/db/orphans';
import { uniqueName } from '../setup/factories';
import { grainId, makeCookRun, makeJars } from '../setup/lab-rows';

/** Far above any id a test makes, so it points at no row. */
const MISSING_ID = 4_000_000_001;

const insertJar = async (
  cookRunId: number,
  run: (sql: string, p: unknown[]) => Promise<unknown> = (sql, p) => dataSource.query(sql, p),
) =>
  run('INSERT INTO jars (label, grainId, cookRunId, inoculatedAt, inoculatedOn) VALUES (?, ?, ?, NOW(), CURDATE())', [
    uniqueName('FK'),
    await grainId(),
    cookRunId,
  ]);

describe('foreign keys', () => {
  it('refuses a jar that names a cook run that does not exist', async () => {
    await expect(insertJar(MISSING_ID)).rejects.toMatchObject({ code: 'ER_NO_REFERENCED_ROW_2' });
  });

  it('refuses an incident link to a jar that does not exist', async () => {
    const [jar] = await makeJars(1, { inoculatedOn: '2026-03-02' });
    await expect(
      dataSource.query('INSERT INTO incident_jars (incidentId, jarId) VALUES (?, ?)', [MISSING_ID, jar!.id]),
    ).rejects.toMatchObject({ code: 'ER_NO_REFERENCED_ROW_2' });
  });

  it('refuses to delete a cook run its jars still point at', async () => {
    const run = await makeCookRun();
    await makeJars(1, { inoculatedOn: '2026-03-02', cookRunId: run.id });
    await expect(dataSource.query('DELETE FROM cook_runs WHERE id = ?', [run.id])).rejects.toMatchObject({
      code: 'ER_ROW_IS_REFERENCED_2',
    });
  });

  it('has a key for every relation the entities declare, and no other', () => {
    const declared = dataSource.entityMetadatas.flatMap((e) =>
      e.foreignKeys.map((fk) => `${e.tableName}.${fk.columnNames.join()} → ${fk.referencedTablePath}`),
    );
    const migrated = foreignKeys.map((k) => `${k.table}.${k.column} → ${k.references}`);
    expect(new Set(migrated).size).toBe(migrated.length);
    expect([...migrated].sort()).toEqual([...declared].sort());
  });
});

describe('orphan check before the keys are added', () => {
  it('names the table, the column, the row count and the missing id of an orphan', async () => {
    const runner = dataSource.createQueryRunner();
    await runner.connect();
    try {
      // The orphan exists only inside this connection's rolled-back transaction.
      await runner.query('SET FOREIGN_KEY_CHECKS = 0');
      await runner.startTransaction();
      await insertJar(MISSING_ID, (sql, p) => runner.query(sql, p));

      const orphans = await findOrphans(runner, foreignKeys);
      expect(orphans).toEqual([
        { table: 'jars', column: 'cookRunId', references: 'cook_runs', rows: 1, missing: [MISSING_ID] },
      ]);
      await expect(assertNoOrphans(runner, foreignKeys)).rejects.toThrow(
        `jars.cookRunId → cook_runs.id: 1 row(s) point at missing ids ${MISSING_ID}`,
      );
    } finally {
      if (runner.isTransactionActive) await runner.rollbackTransaction();
      await runner.query('SET FOREIGN_KEY_CHECKS = 1');
      await runner.release();
    }
  });

  it('finds nothing in a database whose keys are all in place', async () => {
    const runner = dataSource.createQueryRunner();
    try {
      await expect(findOrphans(runner, foreignKeys)).resolves.toEqual([]);
    } finally {
      await runner.release();
    }
  });
});
