import { MigrationInterface, QueryRunner } from "typeorm";

export class JarEventsMoveIndex1796218450683 implements MigrationInterface {
    name = 'JarEventsMoveIndex1796218450683'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE INDEX \`IDX_5c7b32c89407bd8a50306ea42c\` ON \`jar_events\` (\`type\`, \`jarId\`, \`at\`)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_5c7b32c89407bd8a50306ea42c\` ON \`jar_events\``);
    }

}
