import type { MigrationInterface, QueryRunner } from 'typeorm';
import { assertNoOrphans, type Reference } from '../orphans';

/** Every reference between our tables; names as TypeORM generates them from the entities' relations. */
export const foreignKeys: (Reference & { name: string })[] = [
  { name: 'FK_ca95e8c5e5130e53ea849bbe189', table: 'audit_events', column: 'userId', references: 'users' },
  { name: 'FK_ae49728f3b90d60c584161f1524', table: 'cook_runs', column: 'operatorId', references: 'users' },
  { name: 'FK_e5e6d2e75bd73eb3d835d526c31', table: 'cook_run_readings', column: 'cookRunId', references: 'cook_runs' },
  { name: 'FK_a8ccdfc3e8012864fdaadad287f', table: 'cultures', column: 'parentCultureId', references: 'cultures' },
  { name: 'FK_555e65a79c560d678712a3aec1e', table: 'photos', column: 'uploadedById', references: 'users' },
  { name: 'FK_363e43b6b409b794def376f540a', table: 'agar_tests', column: 'cultureId', references: 'cultures' },
  { name: 'FK_bbde3dbfe7efb468ddd3170dbf4', table: 'agar_tests', column: 'photoId', references: 'photos' },
  { name: 'FK_f46b1910ce7cbea55c20f0a401f', table: 'agar_tests', column: 'recordedById', references: 'users' },
  { name: 'FK_30efe901738e57ef9f48d570915', table: 'grain_lots', column: 'grainId', references: 'grains' },
  { name: 'FK_028bdf5766bdff412203e77334b', table: 'prep_batches', column: 'grainLotId', references: 'grain_lots' },
  { name: 'FK_c1ba01f09b2afa268d17e96fcb7', table: 'incidents', column: 'foundById', references: 'users' },
  { name: 'FK_d5efaf30d8cb508318ce25df35c', table: 'incidents', column: 'createdById', references: 'users' },
  { name: 'FK_e3180d3a6d428a00ed0ace68fb2', table: 'corrective_actions', column: 'incidentId', references: 'incidents' },
  { name: 'FK_8ffa6fb6443cdb17cd4de6e70b1', table: 'corrective_actions', column: 'ownerId', references: 'users' },
  { name: 'FK_b11719f8cadd28c8419c759f009', table: 'corrective_actions', column: 'ownerStaffId', references: 'staff_members' },
  { name: 'FK_974e65fd4f67ae9b5f983b8f7f0', table: 'idempotent_requests', column: 'userId', references: 'users' },
  { name: 'FK_2ac184390ccf94ab12e3b269b4f', table: 'procedure_versions', column: 'procedureId', references: 'procedures' },
  { name: 'FK_a39a29fdda75ecc76b168971ba4', table: 'procedure_versions', column: 'publishedById', references: 'users' },
  { name: 'FK_0fe7dc9faffc4992f2145014edb', table: 'inoculation_sessions', column: 'operatorId', references: 'users' },
  { name: 'FK_647249367a102c5f7544d7f7803', table: 'inoculation_sessions', column: 'staffId', references: 'staff_members' },
  { name: 'FK_379ebaf6cbc94056db7197f964e', table: 'inoculation_sessions', column: 'procedureVersionId', references: 'procedure_versions' },
  { name: 'FK_668ea5308c3fa5c85339f64af11', table: 'jars', column: 'grainId', references: 'grains' },
  { name: 'FK_1286490efdaa55215fff37e00b5', table: 'jars', column: 'prepBatchId', references: 'prep_batches' },
  { name: 'FK_f903947039e80d33fbf9db5bdc3', table: 'jars', column: 'cookRunId', references: 'cook_runs' },
  { name: 'FK_7cf597cec93bcc531a1f9c9551c', table: 'jars', column: 'sessionId', references: 'inoculation_sessions' },
  { name: 'FK_a05ac4225bdf414c0ee36326dd0', table: 'jars', column: 'cultureId', references: 'cultures' },
  { name: 'FK_7c5a289b7591d9d25427cdb2c77', table: 'jars', column: 'parentJarId', references: 'jars' },
  { name: 'FK_86a22ddbe2db45ed1ba494df0a4', table: 'incident_jars', column: 'incidentId', references: 'incidents' },
  { name: 'FK_1185b26d95855101fe90222f15f', table: 'incident_jars', column: 'jarId', references: 'jars' },
  { name: 'FK_53381a3d2ccbc5bd312dca9dfd2', table: 'incident_photos', column: 'incidentId', references: 'incidents' },
  { name: 'FK_5325526d08891c9993ca29c5333', table: 'incident_photos', column: 'photoId', references: 'photos' },
  { name: 'FK_449c4bb9b7989e9d563aca657c0', table: 'incident_photos', column: 'addedById', references: 'users' },
  { name: 'FK_051ae5fee8840b5fb3e75224bd8', table: 'jar_events', column: 'jarId', references: 'jars' },
  { name: 'FK_d0ecc469ec43bba37e2794e7ec1', table: 'jar_events', column: 'byUserId', references: 'users' },
  { name: 'FK_80752fb2a323294eed6049aee14', table: 'jar_events', column: 'photoId', references: 'photos' },
  { name: 'FK_0371f192326fd07a5032978e034', table: 'cluster_alerts', column: 'triggeredByIncidentId', references: 'incidents' },
  { name: 'FK_5408d6cdb800691a1f2c82d340b', table: 'mail_preferences', column: 'userId', references: 'users' },
  { name: 'FK_001b50457e1919aa36a3e9da5b1', table: 'sent_mails', column: 'toUserId', references: 'users' },
  { name: 'FK_7ae6ade9fc7dd6751a1bae129ce', table: 'procedure_steps', column: 'versionId', references: 'procedure_versions' },
  { name: 'FK_cd82d8507dfa912e12992851768', table: 'incident_step_links', column: 'incidentId', references: 'incidents' },
  { name: 'FK_4db8b8405b2bc1d75f78690a076', table: 'incident_step_links', column: 'stepId', references: 'procedure_steps' },
  { name: 'FK_3a34914b19ee71389b993e8f03b', table: 'incident_step_links', column: 'linkedById', references: 'users' },
  { name: 'FK_a42a5d24812b0c7c6830f14da4a', table: 'session_step_checks', column: 'sessionId', references: 'inoculation_sessions' },
  { name: 'FK_b13262ce61a9c8e882dc05d88f3', table: 'session_step_checks', column: 'stepId', references: 'procedure_steps' },
  { name: 'FK_562eabf786b9499d5ed226a6812', table: 'retraining_requests', column: 'userId', references: 'users' },
  { name: 'FK_58717269f14fbdd8d6342981c23', table: 'retraining_requests', column: 'staffId', references: 'staff_members' },
  { name: 'FK_c3aaf1909c00f42ba490809ea60', table: 'retraining_requests', column: 'procedureVersionId', references: 'procedure_versions' },
  { name: 'FK_78d36049a3e7436603f2730cfed', table: 'retraining_requests', column: 'requestedById', references: 'users' },
  { name: 'FK_00811346fea551d91903d342f3f', table: 'training_records', column: 'userId', references: 'users' },
  { name: 'FK_61b466689801697cc4b5e1807a6', table: 'training_records', column: 'staffId', references: 'staff_members' },
  { name: 'FK_ba34f04621cfb33f2ed38242772', table: 'training_records', column: 'procedureVersionId', references: 'procedure_versions' },
  { name: 'FK_b36f3a431ed66cfc863ce18f8bd', table: 'training_records', column: 'trainerId', references: 'users' },
];

export class ForeignKeys1796284724480 implements MigrationInterface {
  name = 'ForeignKeys1796284724480';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await assertNoOrphans(queryRunner, foreignKeys);
    for (const k of foreignKeys) {
      await queryRunner.query(
        `ALTER TABLE \`${k.table}\` ADD CONSTRAINT \`${k.name}\` FOREIGN KEY (\`${k.column}\`) REFERENCES \`${k.references}\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
      );
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    for (const k of [...foreignKeys].reverse()) {
      await queryRunner.query(`ALTER TABLE \`${k.table}\` DROP FOREIGN KEY \`${k.name}\``);
      // MariaDB made an index for a key whose column had none; it goes with the key.
      await queryRunner.query(`DROP INDEX IF EXISTS \`${k.name}\` ON \`${k.table}\``);
    }
  }
}
