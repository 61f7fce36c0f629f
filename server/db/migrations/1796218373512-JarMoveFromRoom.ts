import { MigrationInterface, QueryRunner } from "typeorm";

export class JarMoveFromRoom1796218373512 implements MigrationInterface {
    name = 'JarMoveFromRoom1796218373512'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`jar_events\` ADD \`fromRoom\` varchar(40) NULL`);
        // Moves recorded before this column: a later move left the room the previous move reached; a
        // jar's first move left the room its audit entry names as the old value.
        await queryRunner.query(`UPDATE \`jar_events\` e JOIN (SELECT id, LAG(room) OVER (PARTITION BY jarId ORDER BY at, id) AS prev FROM \`jar_events\` WHERE type = 'moved') p ON p.id = e.id SET e.fromRoom = p.prev WHERE p.prev IS NOT NULL`);
        await queryRunner.query(`UPDATE \`jar_events\` e JOIN (SELECT CAST(recordId AS UNSIGNED) AS jarId, TRIM(BOTH '"' FROM SUBSTRING_INDEX(GROUP_CONCAT(oldValue ORDER BY id), ',', 1)) AS firstRoom FROM \`audit_events\` WHERE action = 'jar-moved' AND field = 'room' AND oldValue IS NOT NULL GROUP BY recordId) a ON a.jarId = e.jarId SET e.fromRoom = a.firstRoom WHERE e.type = 'moved' AND e.fromRoom IS NULL AND NOT EXISTS (SELECT 1 FROM (SELECT jarId, at, id FROM \`jar_events\` WHERE type = 'moved') x WHERE x.jarId = e.jarId AND (x.at < e.at OR (x.at = e.at AND x.id < e.id)))`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`jar_events\` DROP COLUMN \`fromRoom\``);
    }

}
