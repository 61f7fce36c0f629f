import { MigrationInterface, QueryRunner } from "typeorm";

export class JarsAnalysisIndex1796166996992 implements MigrationInterface {
    name = 'JarsAnalysisIndex1796166996992'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE INDEX \`IDX_jars_analysis\` ON \`jars\` (\`inoculatedOn\`, \`grainId\`, \`cookRunId\`, \`sessionId\`, \`cultureId\`, \`prepBatchId\`, \`room\`)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_jars_analysis\` ON \`jars\``);
    }

}
