import { MigrationInterface, QueryRunner } from "typeorm";

export class Foundation1796165211497 implements MigrationInterface {
    name = 'Foundation1796165211497'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`audit_events\` (\`id\` bigint UNSIGNED NOT NULL AUTO_INCREMENT, \`userId\` int UNSIGNED NULL, \`userName\` varchar(120) NOT NULL, \`at\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`action\` varchar(40) NOT NULL, \`recordType\` varchar(40) NOT NULL, \`recordId\` varchar(64) NOT NULL, \`field\` varchar(64) NULL, \`oldValue\` text NULL, \`newValue\` text NULL, \`reason\` varchar(500) NULL, INDEX \`IDX_528d12ea8bf9f8b24cee6420d3\` (\`recordType\`, \`recordId\`, \`at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`login_failures\` (\`id\` bigint UNSIGNED NOT NULL AUTO_INCREMENT, \`username\` varchar(64) NOT NULL, \`address\` varchar(64) NOT NULL, \`failedAt\` datetime(3) NOT NULL, INDEX \`IDX_8d5d511c426e32e4cefeb6146e\` (\`address\`, \`failedAt\`), INDEX \`IDX_f63a78185177f98e31864485e6\` (\`username\`, \`failedAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`sessions\` (\`session_id\` varchar(128) COLLATE "utf8mb4_bin" NOT NULL, \`expires\` int UNSIGNED NOT NULL, \`data\` mediumtext COLLATE "utf8mb4_bin" NULL, PRIMARY KEY (\`session_id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`users\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`username\` varchar(64) NOT NULL, \`displayName\` varchar(120) NOT NULL, \`email\` varchar(254) NULL, \`role\` enum ('technician', 'supervisor', 'trainer', 'admin') NOT NULL, \`passwordHash\` varchar(100) NOT NULL, \`active\` tinyint NOT NULL DEFAULT 1, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updatedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_fe0bb3f6520ee0469504521e71\` (\`username\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_fe0bb3f6520ee0469504521e71\` ON \`users\``);
        await queryRunner.query(`DROP TABLE \`users\``);
        await queryRunner.query(`DROP TABLE \`sessions\``);
        await queryRunner.query(`DROP INDEX \`IDX_f63a78185177f98e31864485e6\` ON \`login_failures\``);
        await queryRunner.query(`DROP INDEX \`IDX_8d5d511c426e32e4cefeb6146e\` ON \`login_failures\``);
        await queryRunner.query(`DROP TABLE \`login_failures\``);
        await queryRunner.query(`DROP INDEX \`IDX_528d12ea8bf9f8b24cee6420d3\` ON \`audit_events\``);
        await queryRunner.query(`DROP TABLE \`audit_events\``);
    }

}
