import type { MigrationInterface, QueryRunner } from 'typeorm';
import { levelRollupSql } from '../../tallies/jar-keys.sql';

/** The counts rolled up per day and factor level, filled from each jar's row as last counted. */
export class AnalysisLevelTallies1796310345708 implements MigrationInterface {
  name = 'AnalysisLevelTallies1796310345708';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`tally_levels\` (\`factor\` varchar(12) NOT NULL, \`levelId\` int UNSIGNED NOT NULL, \`room\` varchar(40) NOT NULL, \`inoculatedOn\` date NOT NULL, \`jars\` int NOT NULL, \`contaminated\` int NOT NULL, PRIMARY KEY (\`factor\`, \`levelId\`, \`room\`, \`inoculatedOn\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `INSERT INTO tally_levels (factor, inoculatedOn, levelId, room, jars, contaminated) ${levelRollupSql(1, '1')}`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `tally_levels`');
  }
}
