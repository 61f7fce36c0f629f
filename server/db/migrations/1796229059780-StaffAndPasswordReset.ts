import { MigrationInterface, QueryRunner } from "typeorm";

/**
 * Operators and owners kept only as names become staff people; the names stay on their records.
 * The table's collation is case-insensitive, so "ana" and "Ana" land on one person. Safe to run again.
 */
export async function moveNamesToStaff(q: QueryRunner): Promise<void> {
    await q.query(`INSERT IGNORE INTO \`staff_members\` (\`name\`, \`email\`)
        SELECT TRIM(n.name), MAX(n.email) FROM (
        SELECT operatorName AS name, NULL AS email FROM inoculation_sessions WHERE operatorId IS NULL
        UNION ALL SELECT ownerName, ownerEmail FROM corrective_actions WHERE ownerId IS NULL
        UNION ALL SELECT personName, NULL FROM training_records WHERE userId IS NULL
        ) n WHERE TRIM(COALESCE(n.name, '')) <> '' GROUP BY TRIM(n.name) ORDER BY MIN(TRIM(n.name))`);
    await q.query(`UPDATE inoculation_sessions s JOIN staff_members m ON m.name = TRIM(s.operatorName)
        SET s.staffId = m.id WHERE s.operatorId IS NULL`);
    await q.query(`UPDATE corrective_actions a JOIN staff_members m ON m.name = TRIM(a.ownerName)
        SET a.ownerStaffId = m.id WHERE a.ownerId IS NULL`);
    await q.query(`UPDATE training_records t JOIN staff_members m ON m.name = TRIM(t.personName)
        SET t.staffId = m.id WHERE t.userId IS NULL`);
}


export class StaffAndPasswordReset1796229059780 implements MigrationInterface {
    name = 'StaffAndPasswordReset1796229059780'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`staff_members\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`email\` varchar(254) NULL, \`active\` tinyint NOT NULL DEFAULT 1, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updatedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_938bb221d53eb13bb4d06ee94c\` (\`name\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` ADD \`ownerStaffId\` int UNSIGNED NULL`);
        await queryRunner.query(`ALTER TABLE \`inoculation_sessions\` ADD \`staffId\` int UNSIGNED NULL`);
        await queryRunner.query(`ALTER TABLE \`retraining_requests\` ADD \`staffId\` int UNSIGNED NULL`);
        await queryRunner.query(`ALTER TABLE \`training_records\` ADD \`staffId\` int UNSIGNED NULL`);
        await queryRunner.query(`ALTER TABLE \`users\` ADD \`mustChangePassword\` tinyint NOT NULL DEFAULT 0`);
        await queryRunner.query(`ALTER TABLE \`retraining_requests\` CHANGE \`userId\` \`userId\` int UNSIGNED NULL`);
        await queryRunner.query(`CREATE INDEX \`IDX_647249367a102c5f7544d7f780\` ON \`inoculation_sessions\` (\`staffId\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_010a4149fe86f8fe9d6cb76a19\` ON \`training_records\` (\`staffId\`, \`procedureVersionId\`)`);
        await moveNamesToStaff(queryRunner);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_010a4149fe86f8fe9d6cb76a19\` ON \`training_records\``);
        await queryRunner.query(`DROP INDEX \`IDX_647249367a102c5f7544d7f780\` ON \`inoculation_sessions\``);
        await queryRunner.query(`DELETE FROM \`retraining_requests\` WHERE \`userId\` IS NULL`);
        await queryRunner.query(`ALTER TABLE \`retraining_requests\` CHANGE \`userId\` \`userId\` int UNSIGNED NOT NULL`);
        await queryRunner.query(`ALTER TABLE \`users\` DROP COLUMN \`mustChangePassword\``);
        await queryRunner.query(`ALTER TABLE \`training_records\` DROP COLUMN \`staffId\``);
        await queryRunner.query(`ALTER TABLE \`retraining_requests\` DROP COLUMN \`staffId\``);
        await queryRunner.query(`ALTER TABLE \`inoculation_sessions\` DROP COLUMN \`staffId\``);
        await queryRunner.query(`ALTER TABLE \`corrective_actions\` DROP COLUMN \`ownerStaffId\``);
        await queryRunner.query(`DROP INDEX \`IDX_938bb221d53eb13bb4d06ee94c\` ON \`staff_members\``);
        await queryRunner.query(`DROP TABLE \`staff_members\``);
    }

}
