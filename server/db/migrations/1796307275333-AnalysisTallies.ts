import type { MigrationInterface, QueryRunner } from 'typeorm';
import { comboKeyList, detectionKeyList, everyJar, jarKeysSql, tallyKeyList } from '../../tallies/jar-keys.sql';

/**
 * The analysis counts and each jar's row in them, filled from the records already held. The fill uses
 * today's counting rule (server/tallies/jar-keys.sql.ts); a later change to that rule rebuilds the counts
 * in its own migration, as `npm run tallies:rebuild` would.
 */
export class AnalysisTallies1796307275333 implements MigrationInterface {
  name = 'AnalysisTallies1796307275333';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`tally_counts\` (\`inoculatedOn\` date NOT NULL, \`grainId\` int UNSIGNED NOT NULL, \`cookRunId\` int UNSIGNED NOT NULL, \`sessionId\` int UNSIGNED NOT NULL, \`cultureId\` int UNSIGNED NOT NULL, \`prepBatchId\` int UNSIGNED NOT NULL, \`room\` varchar(40) NOT NULL, \`transfers\` tinyint UNSIGNED NOT NULL, \`jars\` int NOT NULL, \`contaminated\` int NOT NULL, PRIMARY KEY (\`inoculatedOn\`, \`grainId\`, \`cookRunId\`, \`sessionId\`, \`cultureId\`, \`prepBatchId\`, \`room\`, \`transfers\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`tally_detections\` (\`inoculatedOn\` date NOT NULL, \`grainId\` int UNSIGNED NOT NULL, \`cookRunId\` int UNSIGNED NOT NULL, \`sessionId\` int UNSIGNED NOT NULL, \`cultureId\` int UNSIGNED NOT NULL, \`prepBatchId\` int UNSIGNED NOT NULL, \`room\` varchar(40) NOT NULL, \`transfers\` tinyint UNSIGNED NOT NULL, \`foundAfterDays\` smallint NOT NULL, \`contaminant\` varchar(40) NOT NULL, \`jars\` int NOT NULL, PRIMARY KEY (\`inoculatedOn\`, \`grainId\`, \`cookRunId\`, \`sessionId\`, \`cultureId\`, \`prepBatchId\`, \`room\`, \`transfers\`, \`foundAfterDays\`, \`contaminant\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`tallied_jars\` (\`jarId\` int UNSIGNED NOT NULL, \`inoculatedOn\` date NOT NULL, \`grainId\` int UNSIGNED NOT NULL, \`cookRunId\` int UNSIGNED NOT NULL, \`sessionId\` int UNSIGNED NOT NULL, \`cultureId\` int UNSIGNED NOT NULL, \`prepBatchId\` int UNSIGNED NOT NULL, \`room\` varchar(40) NOT NULL, \`transfers\` tinyint UNSIGNED NOT NULL, \`contaminated\` tinyint UNSIGNED NOT NULL, \`foundAfterDays\` smallint NOT NULL, \`contaminant\` varchar(40) NOT NULL, PRIMARY KEY (\`jarId\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`tally_state\` (\`id\` tinyint UNSIGNED NOT NULL, \`rebuiltAt\` datetime NULL, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    // The analysis now reads the counts, not the jars: their covering index only slows every write.
    await queryRunner.query('DROP INDEX `IDX_jars_analysis` ON `jars`');
    await queryRunner.query('INSERT INTO `tally_state` (`id`, `rebuiltAt`) VALUES (1, NOW())');
    const [settings] = (await queryRunner.query('SELECT observationWindowDays FROM lab_settings WHERE id = 1')) as {
      observationWindowDays: number;
    }[];
    const keys = jarKeysSql(Number(settings?.observationWindowDays ?? 0), everyJar);
    await queryRunner.query(`INSERT INTO tallied_jars (jarId, ${tallyKeyList}) ${keys.sql}`, keys.params);
    await queryRunner.query(
      `INSERT INTO tally_counts (${comboKeyList}, jars, contaminated)
        SELECT ${comboKeyList}, COUNT(*), SUM(contaminated) FROM tallied_jars GROUP BY ${comboKeyList}`,
    );
    await queryRunner.query(
      `INSERT INTO tally_detections (${detectionKeyList}, jars)
        SELECT ${detectionKeyList}, COUNT(*) FROM tallied_jars WHERE contaminated = 1 GROUP BY ${detectionKeyList}`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `tally_state`');
    await queryRunner.query('DROP TABLE `tallied_jars`');
    await queryRunner.query('DROP TABLE `tally_detections`');
    await queryRunner.query('DROP TABLE `tally_counts`');
    await queryRunner.query(
      'CREATE INDEX `IDX_jars_analysis` ON `jars` (`inoculatedOn`, `grainId`, `cookRunId`, `sessionId`, `cultureId`, `prepBatchId`, `room`)',
    );
  }
}
