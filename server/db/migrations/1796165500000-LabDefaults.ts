import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Written by hand: the default grain list (DESIGN.md §3) and the settings row every lab starts with. */
export class LabDefaults1796165500000 implements MigrationInterface {
  name = 'LabDefaults1796165500000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    const grains = ['rye', 'sorghum', 'brown rice', 'maize', 'millet', 'wheat', 'oats'];
    await queryRunner.query(
      `INSERT IGNORE INTO \`grains\` (\`name\`) VALUES ${grains.map(() => '(?)').join(', ')}`,
      grains,
    );
    await queryRunner.query(
      "INSERT IGNORE INTO `lab_settings` (`id`, `cookBucketEdges`, `lethalityTarget`, `observationWindowDays`, `clusterIncidents`, `clusterDays`) VALUES (1, '[60,90,120,180]', 15, 21, 3, 7)",
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DELETE FROM `lab_settings` WHERE `id` = 1');
    await queryRunner.query(
      "DELETE FROM `grains` WHERE `name` IN ('rye', 'sorghum', 'brown rice', 'maize', 'millet', 'wheat', 'oats')",
    );
  }
}
