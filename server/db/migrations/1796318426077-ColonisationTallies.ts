import type { MigrationInterface, QueryRunner } from 'typeorm';
import {
  colonisationKeyList,
  colonisationKeysSql,
  colonisationRollupSql,
} from '../../tallies/colonisation-keys.sql';
import { everyJar } from '../../tallies/jar-keys.sql';

/** How each jar's time to colonisation ends, and the jars per grain, day and ending, filled from the records. */
export class ColonisationTallies1796318426077 implements MigrationInterface {
  name = 'ColonisationTallies1796318426077';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`tallied_colonisation\` (\`jarId\` int UNSIGNED NOT NULL, \`grainId\` int UNSIGNED NOT NULL, \`inoculatedOn\` date NOT NULL, \`ending\` varchar(9) NOT NULL, \`days\` smallint NOT NULL, PRIMARY KEY (\`jarId\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`tally_colonisation\` (\`grainId\` int UNSIGNED NOT NULL, \`inoculatedOn\` date NOT NULL, \`ending\` varchar(9) NOT NULL, \`days\` smallint NOT NULL, \`jars\` int NOT NULL, PRIMARY KEY (\`grainId\`, \`inoculatedOn\`, \`ending\`, \`days\`)) ENGINE=InnoDB`,
    );
    const keys = colonisationKeysSql(everyJar);
    await queryRunner.query(`INSERT INTO tallied_colonisation (jarId, ${colonisationKeyList}) ${keys.sql}`, keys.params);
    await queryRunner.query(
      `INSERT INTO tally_colonisation (${colonisationKeyList}, jars) ${colonisationRollupSql(1, '1')}`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `tally_colonisation`');
    await queryRunner.query('DROP TABLE `tallied_colonisation`');
  }
}
