import { MigrationInterface, QueryRunner } from "typeorm";

export class IdempotentRequests1796218378129 implements MigrationInterface {
    name = 'IdempotentRequests1796218378129'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`idempotent_requests\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`userId\` int UNSIGNED NOT NULL, \`key\` varchar(100) NOT NULL, \`scope\` varchar(40) NOT NULL, \`recordId\` int UNSIGNED NULL, \`status\` smallint UNSIGNED NULL, \`body\` longtext NULL, \`undoneAt\` datetime(6) NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`UQ_idempotent_requests_user_key\` (\`userId\`, \`key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`UQ_idempotent_requests_user_key\` ON \`idempotent_requests\``);
        await queryRunner.query(`DROP TABLE \`idempotent_requests\``);
    }

}
