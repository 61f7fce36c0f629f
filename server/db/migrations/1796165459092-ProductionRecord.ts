import { MigrationInterface, QueryRunner } from "typeorm";

export class ProductionRecord1796165459092 implements MigrationInterface {
    name = 'ProductionRecord1796165459092'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`cook_run_readings\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`cookRunId\` int UNSIGNED NOT NULL, \`minute\` double NOT NULL, \`celsius\` double NOT NULL, UNIQUE INDEX \`IDX_e52b4a7abb02f2521bbb83461c\` (\`cookRunId\`, \`minute\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`cook_runs\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`vessel\` varchar(80) NULL, \`startedAt\` datetime NULL, \`cookedOn\` date NULL, \`minutesAtPressure\` int NOT NULL, \`gaugeKPa\` double NULL, \`ventingMinutes\` int NULL, \`altitudeM\` int NOT NULL DEFAULT '0', \`container\` varchar(40) NULL, \`loadCount\` int NULL, \`operatorId\` int UNSIGNED NULL, \`operatorName\` varchar(120) NULL, \`f0\` double NULL, \`f0Source\` enum ('log', 'estimate') NULL, \`notes\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_90626f1cd2fbf392a7972d4949\` (\`cookedOn\`), UNIQUE INDEX \`IDX_3ef9c6c6fd6cb9967498755db5\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`agar_tests\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`cultureId\` int UNSIGNED NOT NULL, \`testedOn\` date NOT NULL, \`result\` enum ('clean', 'contaminated', 'inconclusive') NOT NULL, \`photoId\` int UNSIGNED NULL, \`notes\` text NULL, \`recordedById\` int UNSIGNED NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_363e43b6b409b794def376f540\` (\`cultureId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`cultures\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`species\` varchar(120) NULL, \`strain\` varchar(120) NULL, \`preparedOn\` date NULL, \`generation\` int NULL, \`volumeMl\` double NULL, \`parentCultureId\` int UNSIGNED NULL, \`state\` enum ('quarantined', 'released', 'retired') NOT NULL DEFAULT 'quarantined', \`notes\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_a8ccdfc3e8012864fdaadad287\` (\`parentCultureId\`), UNIQUE INDEX \`IDX_64f280f74fdce33c5d3f8400e5\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`grain_lots\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`grainId\` int UNSIGNED NOT NULL, \`supplierLotCode\` varchar(80) NOT NULL, \`receivedOn\` date NOT NULL, \`notes\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_c1f6444e3351f111cf4c220b7a\` (\`grainId\`, \`supplierLotCode\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`grains\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`name\` varchar(60) NOT NULL, \`active\` tinyint NOT NULL DEFAULT 1, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_12113712503867ff015e34dc35\` (\`name\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`prep_batches\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`grainLotId\` int UNSIGNED NOT NULL, \`preparedOn\` date NOT NULL, \`soakHours\` double NULL, \`simmerMinutes\` int NULL, \`drainMinutes\` int NULL, \`notes\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_845ea16ff17c45811520ebff82\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`corrective_actions\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`incidentId\` int UNSIGNED NOT NULL, \`what\` text NOT NULL, \`ownerId\` int UNSIGNED NULL, \`ownerName\` varchar(120) NOT NULL, \`dueOn\` date NOT NULL, \`doneOn\` date NULL, \`verification\` text NULL, \`factor\` enum ('grain', 'cookRun', 'cookMinutes', 'session', 'operator', 'culture', 'week', 'prepBatch', 'workspace', 'room') NULL, \`level\` varchar(120) NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_e3180d3a6d428a00ed0ace68fb\` (\`incidentId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`incident_jars\` (\`incidentId\` int UNSIGNED NOT NULL, \`jarId\` int UNSIGNED NOT NULL, INDEX \`IDX_1185b26d95855101fe90222f15\` (\`jarId\`), PRIMARY KEY (\`incidentId\`, \`jarId\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`incident_photos\` (\`incidentId\` int UNSIGNED NOT NULL, \`photoId\` int UNSIGNED NOT NULL, \`caption\` varchar(200) NULL, \`addedById\` int UNSIGNED NULL, \`addedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), PRIMARY KEY (\`incidentId\`, \`photoId\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`incidents\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`foundAt\` datetime NOT NULL, \`foundOn\` date NOT NULL, \`foundById\` int UNSIGNED NULL, \`foundByName\` varchar(120) NOT NULL, \`stage\` enum ('incubation', 'after-shaking', 'grow-room', 'customer') NOT NULL DEFAULT 'incubation', \`contaminant\` enum ('bacterial', 'trichoderma', 'penicillium', 'aspergillus', 'pin-mould', 'neurospora', 'cobweb', 'yeast', 'unknown') NOT NULL, \`signColour\` varchar(120) NULL, \`signSmell\` varchar(120) NULL, \`signTexture\` varchar(120) NULL, \`severity\` enum ('low', 'medium', 'high') NOT NULL DEFAULT 'medium', \`sealed\` tinyint NOT NULL DEFAULT 0, \`sterilisedBeforeDisposal\` tinyint NOT NULL DEFAULT 0, \`status\` enum ('open', 'in-review', 'closed') NOT NULL DEFAULT 'open', \`verdict\` enum ('pending', 'confirmed', 'ruled-out') NOT NULL DEFAULT 'pending', \`voided\` tinyint NOT NULL DEFAULT 0, \`voidReason\` varchar(500) NULL, \`causeCategory\` enum ('people', 'machine', 'method', 'material', 'measurement', 'environment') NULL, \`rootCauseNotes\` text NULL, \`notes\` text NULL, \`imported\` tinyint NOT NULL DEFAULT 0, \`createdById\` int UNSIGNED NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updatedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), \`version\` int NOT NULL, INDEX \`IDX_0e4a51e0147684d9bfc6083659\` (\`foundOn\`), INDEX \`IDX_644e2a126000450564d9928a39\` (\`contaminant\`), INDEX \`IDX_a96dd981fbe17acb4592915a39\` (\`status\`, \`verdict\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`jar_events\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`jarId\` int UNSIGNED NOT NULL, \`type\` enum ('check', 'shaken', 'moved', 'released', 'hold', 'discarded', 'status') NOT NULL, \`at\` datetime NOT NULL, \`onDate\` date NOT NULL, \`byUserId\` int UNSIGNED NULL, \`byName\` varchar(120) NOT NULL, \`percentColonised\` int NULL, \`room\` varchar(40) NULL, \`shelf\` varchar(40) NULL, \`releasedTo\` enum ('grow-room', 'customer') NULL, \`releasedToWho\` varchar(120) NULL, \`newStatus\` varchar(20) NULL, \`photoId\` int UNSIGNED NULL, \`note\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_a12ed2f2918ea9a4e93cf2ce13\` (\`jarId\`, \`at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`jars\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`label\` varchar(40) NOT NULL, \`grainId\` int UNSIGNED NOT NULL, \`prepBatchId\` int UNSIGNED NULL, \`cookRunId\` int UNSIGNED NULL, \`sessionId\` int UNSIGNED NULL, \`cultureId\` int UNSIGNED NULL, \`parentJarId\` int UNSIGNED NULL, \`inoculumMl\` double NULL, \`room\` varchar(40) NULL, \`shelf\` varchar(40) NULL, \`shelfPosition\` int NULL, \`status\` enum ('incubating', 'colonised', 'contaminated', 'on-hold', 'discarded', 'released') NOT NULL DEFAULT 'incubating', \`inoculatedAt\` datetime NOT NULL, \`inoculatedOn\` date NOT NULL, \`colonisedOn\` date NULL, \`endedOn\` date NULL, \`imported\` tinyint NOT NULL DEFAULT 0, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_668ea5308c3fa5c85339f64af1\` (\`grainId\`), INDEX \`IDX_1286490efdaa55215fff37e00b\` (\`prepBatchId\`), INDEX \`IDX_f903947039e80d33fbf9db5bdc\` (\`cookRunId\`), INDEX \`IDX_7cf597cec93bcc531a1f9c9551\` (\`sessionId\`), INDEX \`IDX_a05ac4225bdf414c0ee36326dd\` (\`cultureId\`), INDEX \`IDX_7c5a289b7591d9d25427cdb2c7\` (\`parentJarId\`), INDEX \`IDX_b514a9c968e872650ff2b41828\` (\`status\`), INDEX \`IDX_36fd6b17ac25a3c73efd3cf795\` (\`inoculatedOn\`), INDEX \`IDX_c8ff1035299a99b2565facb4a7\` (\`room\`, \`shelf\`), UNIQUE INDEX \`IDX_71458af57815b74aed4864ab14\` (\`label\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`photos\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`sha256\` char(64) NOT NULL, \`mime\` varchar(40) NOT NULL, \`bytes\` int UNSIGNED NOT NULL, \`width\` int UNSIGNED NULL, \`height\` int UNSIGNED NULL, \`storageKey\` varchar(200) NOT NULL, \`thumbKey\` varchar(200) NULL, \`uploadedById\` int UNSIGNED NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_669668a3f08b1f2a9fe10d5965\` (\`sha256\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`incident_step_links\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`incidentId\` int UNSIGNED NOT NULL, \`stepId\` int UNSIGNED NOT NULL, \`linkedById\` int UNSIGNED NULL, \`linkedByName\` varchar(120) NOT NULL, \`note\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_4db8b8405b2bc1d75f78690a07\` (\`stepId\`), UNIQUE INDEX \`IDX_af26d3e314ba846172507c9d43\` (\`incidentId\`, \`stepId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`procedure_steps\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`versionId\` int UNSIGNED NOT NULL, \`position\` int NOT NULL, \`text\` varchar(500) NOT NULL, \`caution\` varchar(500) NULL, UNIQUE INDEX \`IDX_acdacbb43cee4331de2c024afe\` (\`versionId\`, \`position\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`procedure_versions\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`procedureId\` int UNSIGNED NOT NULL, \`version\` int NOT NULL, \`title\` varchar(200) NOT NULL, \`changeNote\` text NULL, \`publishedById\` int UNSIGNED NULL, \`publishedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_6f2d83e708f0a4ab4330697047\` (\`procedureId\`, \`version\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`procedures\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`title\` varchar(200) NOT NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_8f0dd6bd4d8e1abaaf816856e2\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`inoculation_sessions\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`code\` varchar(40) NOT NULL, \`heldOn\` date NOT NULL, \`startedAt\` datetime NULL, \`operatorId\` int UNSIGNED NULL, \`operatorName\` varchar(120) NULL, \`workspace\` enum ('still-air-box', 'flow-hood', 'open-bench') NULL, \`procedureVersionId\` int UNSIGNED NULL, \`notes\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_62a26b94539fa41d64966399c3\` (\`heldOn\`), UNIQUE INDEX \`IDX_30d22b5c3dd1e12ba133bf35d8\` (\`code\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`session_step_checks\` (\`sessionId\` int UNSIGNED NOT NULL, \`stepId\` int UNSIGNED NOT NULL, \`done\` tinyint NOT NULL, PRIMARY KEY (\`sessionId\`, \`stepId\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`lab_settings\` (\`id\` int UNSIGNED NOT NULL, \`cookBucketEdges\` json NOT NULL, \`lethalityTarget\` double NOT NULL DEFAULT '15', \`observationWindowDays\` int NOT NULL DEFAULT '21', \`clusterIncidents\` int NOT NULL DEFAULT '3', \`clusterDays\` int NOT NULL DEFAULT '7', \`updatedAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`retraining_requests\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`userId\` int UNSIGNED NOT NULL, \`procedureVersionId\` int UNSIGNED NOT NULL, \`requestedById\` int UNSIGNED NULL, \`reason\` text NULL, \`doneAt\` datetime NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`training_records\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`userId\` int UNSIGNED NULL, \`personName\` varchar(120) NOT NULL, \`procedureVersionId\` int UNSIGNED NOT NULL, \`trainerId\` int UNSIGNED NULL, \`trainerName\` varchar(120) NOT NULL, \`trainedOn\` date NOT NULL, \`notes\` text NULL, \`createdAt\` datetime(6) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_9fc2de6ce2d787543efb504d99\` (\`userId\`, \`procedureVersionId\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_9fc2de6ce2d787543efb504d99\` ON \`training_records\``);
        await queryRunner.query(`DROP TABLE \`training_records\``);
        await queryRunner.query(`DROP TABLE \`retraining_requests\``);
        await queryRunner.query(`DROP TABLE \`lab_settings\``);
        await queryRunner.query(`DROP TABLE \`session_step_checks\``);
        await queryRunner.query(`DROP INDEX \`IDX_30d22b5c3dd1e12ba133bf35d8\` ON \`inoculation_sessions\``);
        await queryRunner.query(`DROP INDEX \`IDX_62a26b94539fa41d64966399c3\` ON \`inoculation_sessions\``);
        await queryRunner.query(`DROP TABLE \`inoculation_sessions\``);
        await queryRunner.query(`DROP INDEX \`IDX_8f0dd6bd4d8e1abaaf816856e2\` ON \`procedures\``);
        await queryRunner.query(`DROP TABLE \`procedures\``);
        await queryRunner.query(`DROP INDEX \`IDX_6f2d83e708f0a4ab4330697047\` ON \`procedure_versions\``);
        await queryRunner.query(`DROP TABLE \`procedure_versions\``);
        await queryRunner.query(`DROP INDEX \`IDX_acdacbb43cee4331de2c024afe\` ON \`procedure_steps\``);
        await queryRunner.query(`DROP TABLE \`procedure_steps\``);
        await queryRunner.query(`DROP INDEX \`IDX_af26d3e314ba846172507c9d43\` ON \`incident_step_links\``);
        await queryRunner.query(`DROP INDEX \`IDX_4db8b8405b2bc1d75f78690a07\` ON \`incident_step_links\``);
        await queryRunner.query(`DROP TABLE \`incident_step_links\``);
        await queryRunner.query(`DROP INDEX \`IDX_669668a3f08b1f2a9fe10d5965\` ON \`photos\``);
        await queryRunner.query(`DROP TABLE \`photos\``);
        await queryRunner.query(`DROP INDEX \`IDX_71458af57815b74aed4864ab14\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_c8ff1035299a99b2565facb4a7\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_36fd6b17ac25a3c73efd3cf795\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_b514a9c968e872650ff2b41828\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_7c5a289b7591d9d25427cdb2c7\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_a05ac4225bdf414c0ee36326dd\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_7cf597cec93bcc531a1f9c9551\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_f903947039e80d33fbf9db5bdc\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_1286490efdaa55215fff37e00b\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_668ea5308c3fa5c85339f64af1\` ON \`jars\``);
        await queryRunner.query(`DROP TABLE \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_a12ed2f2918ea9a4e93cf2ce13\` ON \`jar_events\``);
        await queryRunner.query(`DROP TABLE \`jar_events\``);
        await queryRunner.query(`DROP INDEX \`IDX_a96dd981fbe17acb4592915a39\` ON \`incidents\``);
        await queryRunner.query(`DROP INDEX \`IDX_644e2a126000450564d9928a39\` ON \`incidents\``);
        await queryRunner.query(`DROP INDEX \`IDX_0e4a51e0147684d9bfc6083659\` ON \`incidents\``);
        await queryRunner.query(`DROP TABLE \`incidents\``);
        await queryRunner.query(`DROP TABLE \`incident_photos\``);
        await queryRunner.query(`DROP INDEX \`IDX_1185b26d95855101fe90222f15\` ON \`incident_jars\``);
        await queryRunner.query(`DROP TABLE \`incident_jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_e3180d3a6d428a00ed0ace68fb\` ON \`corrective_actions\``);
        await queryRunner.query(`DROP TABLE \`corrective_actions\``);
        await queryRunner.query(`DROP INDEX \`IDX_845ea16ff17c45811520ebff82\` ON \`prep_batches\``);
        await queryRunner.query(`DROP TABLE \`prep_batches\``);
        await queryRunner.query(`DROP INDEX \`IDX_12113712503867ff015e34dc35\` ON \`grains\``);
        await queryRunner.query(`DROP TABLE \`grains\``);
        await queryRunner.query(`DROP INDEX \`IDX_c1f6444e3351f111cf4c220b7a\` ON \`grain_lots\``);
        await queryRunner.query(`DROP TABLE \`grain_lots\``);
        await queryRunner.query(`DROP INDEX \`IDX_64f280f74fdce33c5d3f8400e5\` ON \`cultures\``);
        await queryRunner.query(`DROP INDEX \`IDX_a8ccdfc3e8012864fdaadad287\` ON \`cultures\``);
        await queryRunner.query(`DROP TABLE \`cultures\``);
        await queryRunner.query(`DROP INDEX \`IDX_363e43b6b409b794def376f540\` ON \`agar_tests\``);
        await queryRunner.query(`DROP TABLE \`agar_tests\``);
        await queryRunner.query(`DROP INDEX \`IDX_3ef9c6c6fd6cb9967498755db5\` ON \`cook_runs\``);
        await queryRunner.query(`DROP INDEX \`IDX_90626f1cd2fbf392a7972d4949\` ON \`cook_runs\``);
        await queryRunner.query(`DROP TABLE \`cook_runs\``);
        await queryRunner.query(`DROP INDEX \`IDX_e52b4a7abb02f2521bbb83461c\` ON \`cook_run_readings\``);
        await queryRunner.query(`DROP TABLE \`cook_run_readings\``);
    }

}
