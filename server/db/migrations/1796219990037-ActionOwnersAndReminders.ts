import { MigrationInterface, QueryRunner } from "typeorm";

export class ActionOwnersAndReminders1796219990037 implements MigrationInterface {
    name = 'ActionOwnersAndReminders1796219990037'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` ADD \`ownerEmail\` varchar(254) NULL`);
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` ADD \`assignedMailAt\` datetime(6) NULL`);
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` ADD \`overdueMailAt\` datetime(6) NULL`);
        await queryRunner.query(`ALTER TABLE \`mail_preferences\` CHANGE \`kind\` \`kind\` enum ('new-incident', 'cluster-alert', 'retraining', 'weekly-digest', 'action-assigned', 'action-overdue') NOT NULL`);
        await queryRunner.query(`DROP INDEX \`IDX_cfbd3c480e019ff45fc809ebe7\` ON \`sent_mails\``);
        await queryRunner.query(`ALTER TABLE \`sent_mails\` CHANGE \`kind\` \`kind\` enum ('new-incident', 'cluster-alert', 'retraining', 'weekly-digest', 'action-assigned', 'action-overdue') NOT NULL`);
        await queryRunner.query(`CREATE INDEX \`IDX_59efcf0969a1263d02c4e1b58f\` ON \`corrective_actions\` (\`doneOn\`, \`dueOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_cfbd3c480e019ff45fc809ebe7\` ON \`sent_mails\` (\`kind\`, \`createdAt\`)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_cfbd3c480e019ff45fc809ebe7\` ON \`sent_mails\``);
        await queryRunner.query(`DROP INDEX \`IDX_59efcf0969a1263d02c4e1b58f\` ON \`corrective_actions\``);
        await queryRunner.query(`ALTER TABLE \`sent_mails\` CHANGE \`kind\` \`kind\` enum ('new-incident', 'cluster-alert', 'retraining', 'weekly-digest') NOT NULL`);
        await queryRunner.query(`CREATE INDEX \`IDX_cfbd3c480e019ff45fc809ebe7\` ON \`sent_mails\` (\`kind\`, \`createdAt\`)`);
        await queryRunner.query(`ALTER TABLE \`mail_preferences\` CHANGE \`kind\` \`kind\` enum ('new-incident', 'cluster-alert', 'retraining', 'weekly-digest') NOT NULL`);
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` DROP COLUMN \`overdueMailAt\``);
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` DROP COLUMN \`assignedMailAt\``);
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` DROP COLUMN \`ownerEmail\``);
    }

}
