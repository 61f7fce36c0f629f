import { MigrationInterface, QueryRunner } from "typeorm";

export class TalliedJarIndexes1796319266146 implements MigrationInterface {
    name = 'TalliedJarIndexes1796319266146'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE INDEX \`IDX_tallied_jars_day\` ON \`tallied_jars\` (\`inoculatedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_tallied_jars_room\` ON \`tallied_jars\` (\`room\`, \`inoculatedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_tallied_jars_prep_batch\` ON \`tallied_jars\` (\`prepBatchId\`, \`inoculatedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_tallied_jars_culture\` ON \`tallied_jars\` (\`cultureId\`, \`inoculatedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_tallied_jars_session\` ON \`tallied_jars\` (\`sessionId\`, \`inoculatedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_tallied_jars_cook_run\` ON \`tallied_jars\` (\`cookRunId\`, \`inoculatedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_tallied_jars_grain\` ON \`tallied_jars\` (\`grainId\`, \`inoculatedOn\`)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_tallied_jars_grain\` ON \`tallied_jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_tallied_jars_cook_run\` ON \`tallied_jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_tallied_jars_session\` ON \`tallied_jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_tallied_jars_culture\` ON \`tallied_jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_tallied_jars_prep_batch\` ON \`tallied_jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_tallied_jars_room\` ON \`tallied_jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_tallied_jars_day\` ON \`tallied_jars\``);
    }

}
