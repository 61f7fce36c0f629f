import { MigrationInterface, QueryRunner } from "typeorm";

export class ActionFactorTransfers1796224073437 implements MigrationInterface {
    name = 'ActionFactorTransfers1796224073437'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` CHANGE \`factor\` \`factor\` enum ('grain', 'cookRun', 'cookMinutes', 'session', 'operator', 'culture', 'week', 'transfers', 'prepBatch', 'workspace', 'room') NULL`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` CHANGE \`factor\` \`factor\` enum ('grain', 'cookRun', 'cookMinutes', 'session', 'operator', 'culture', 'week', 'prepBatch', 'workspace', 'room') NULL`);
    }

}
