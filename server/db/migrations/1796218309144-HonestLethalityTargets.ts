import { MigrationInterface, QueryRunner } from 'typeorm';

/** Generated, then given the values the settings row starts with (DESIGN §4.4 and §4.6). */
export class HonestLethalityTargets1796218309144 implements MigrationInterface {
  name = 'HonestLethalityTargets1796218309144';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`cook_runs\` ADD \`logPlacement\` enum ('chamber', 'centre') NULL`);
    // A log stored before placement was asked for cannot be trusted as a jar-centre log.
    await queryRunner.query("UPDATE `cook_runs` SET `logPlacement` = 'chamber' WHERE `f0Source` = 'log'");
    await queryRunner.query(`ALTER TABLE \`lab_settings\` ADD \`containerMinutes\` json NULL`);
    // Common practice at about 103 kPa gauge (shared/TRADE.md §1); the lab sets its own.
    await queryRunner.query(
      `UPDATE \`lab_settings\` SET \`containerMinutes\` = '{"1 L jar":90,"2 L jar":120,"3 kg bag":150}'`,
    );
    await queryRunner.query(`ALTER TABLE \`lab_settings\` MODIFY \`containerMinutes\` json NOT NULL`);
    await queryRunner.query(`ALTER TABLE \`lab_settings\` ADD \`contaminationTarget\` double NOT NULL`);
    // 5 %: common practice varies; a few per cent is good, over 10–20 % a process problem (TRADE.md §1).
    await queryRunner.query('UPDATE `lab_settings` SET `contaminationTarget` = 0.05');
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`lab_settings\` DROP COLUMN \`contaminationTarget\``);
    await queryRunner.query(`ALTER TABLE \`lab_settings\` DROP COLUMN \`containerMinutes\``);
    await queryRunner.query(`ALTER TABLE \`cook_runs\` DROP COLUMN \`logPlacement\``);
  }
}
