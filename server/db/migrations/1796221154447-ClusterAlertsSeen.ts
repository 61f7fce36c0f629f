import { MigrationInterface, QueryRunner } from "typeorm";

export class ClusterAlertsSeen1796221154447 implements MigrationInterface {
    name = 'ClusterAlertsSeen1796221154447'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`cluster_alerts\` ADD \`seenAt\` datetime(6) NULL`);
        await queryRunner.query(`ALTER TABLE \`cluster_alerts\` ADD \`seenByName\` varchar(120) NULL`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`cluster_alerts\` DROP COLUMN \`seenByName\``);
        await queryRunner.query(`ALTER TABLE \`cluster_alerts\` DROP COLUMN \`seenAt\``);
    }

}
