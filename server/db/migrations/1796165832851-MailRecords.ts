import { MigrationInterface, QueryRunner } from "typeorm";

export class MailRecords1796165832851 implements MigrationInterface {
    name = 'MailRecords1796165832851'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`cluster_alerts\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`dimension\` enum ('cookRun', 'culture', 'session') NOT NULL, \`levelId\` int UNSIGNED NOT NULL, \`levelCode\` varchar(40) NOT NULL, \`firstFoundOn\` date NOT NULL, \`lastFoundOn\` date NOT NULL, \`incidentCount\` int NOT NULL, \`triggeredByIncidentId\` int UNSIGNED NOT NULL, \`alertedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_3d10594f69647d521a33c48a78\` (\`dimension\`, \`levelId\`, \`lastFoundOn\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`digest_runs\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`isoWeek\` varchar(8) NOT NULL, \`trigger\` enum ('schedule', 'manual') NOT NULL, \`sent\` int NOT NULL DEFAULT '0', \`failed\` int NOT NULL DEFAULT '0', \`startedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`finishedAt\` datetime(6) NULL, UNIQUE INDEX \`IDX_01a9696cdde39c9be432146011\` (\`isoWeek\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`mail_preferences\` (\`userId\` int UNSIGNED NOT NULL, \`kind\` enum ('new-incident', 'cluster-alert', 'retraining', 'weekly-digest') NOT NULL, \`enabled\` tinyint NOT NULL, \`updatedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), PRIMARY KEY (\`userId\`, \`kind\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`sent_mails\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`kind\` enum ('new-incident', 'cluster-alert', 'retraining', 'weekly-digest') NOT NULL, \`toUserId\` int UNSIGNED NULL, \`toAddress\` varchar(254) NOT NULL, \`subject\` varchar(300) NOT NULL, \`textBody\` mediumtext NOT NULL, \`status\` enum ('sent', 'failed') NOT NULL, \`error\` varchar(1000) NULL, \`messageId\` varchar(250) NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_cfbd3c480e019ff45fc809ebe7\` (\`kind\`, \`createdAt\`), INDEX \`IDX_5227b2112209c4211639a1bd53\` (\`createdAt\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_5227b2112209c4211639a1bd53\` ON \`sent_mails\``);
        await queryRunner.query(`DROP INDEX \`IDX_cfbd3c480e019ff45fc809ebe7\` ON \`sent_mails\``);
        await queryRunner.query(`DROP TABLE \`sent_mails\``);
        await queryRunner.query(`DROP TABLE \`mail_preferences\``);
        await queryRunner.query(`DROP INDEX \`IDX_01a9696cdde39c9be432146011\` ON \`digest_runs\``);
        await queryRunner.query(`DROP TABLE \`digest_runs\``);
        await queryRunner.query(`DROP INDEX \`IDX_3d10594f69647d521a33c48a78\` ON \`cluster_alerts\``);
        await queryRunner.query(`DROP TABLE \`cluster_alerts\``);
    }

}
