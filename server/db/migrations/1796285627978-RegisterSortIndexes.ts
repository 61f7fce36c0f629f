import { MigrationInterface, QueryRunner } from "typeorm";

export class RegisterSortIndexes1796285627978 implements MigrationInterface {
    name = 'RegisterSortIndexes1796285627978'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE INDEX \`IDX_854b91e5e8aceaa4b5bb7acb67\` ON \`cook_runs\` (\`minutesAtPressure\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_e6fcdaff6f2304fa37e4fa2820\` ON \`cook_runs\` (\`container\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_d690f3711477c0d65955403880\` ON \`cook_runs\` (\`f0\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_2996dfbb1107c8cba13bc3b34e\` ON \`cultures\` (\`species\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_1389249a8d27990851a28fc9b4\` ON \`cultures\` (\`preparedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_20f6081e71184c4d3467d6b944\` ON \`cultures\` (\`state\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_e31918854de7a8d531e7a48663\` ON \`grain_lots\` (\`supplierLotCode\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_863e39afb5b41c1d52ebe43d20\` ON \`grain_lots\` (\`receivedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_b6f9e7273c19bb4e90db57360f\` ON \`grain_lots\` (\`createdAt\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_e3e074e2b534696df303aa6a64\` ON \`prep_batches\` (\`preparedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_9cab33aff1872299070c5d7b2f\` ON \`prep_batches\` (\`createdAt\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_1b65ba0cf683d12654a43bc8c9\` ON \`incidents\` (\`foundAt\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_203e158505e46475eb38ce0056\` ON \`incidents\` (\`stage\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_ec3823825f8b286b2e1da93496\` ON \`incidents\` (\`severity\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_6fa7e61c79777de95b6a4ecd63\` ON \`incidents\` (\`status\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_46835bca7fb3a5243585e319cd\` ON \`incidents\` (\`verdict\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_a5974c0dd050208027da774b9d\` ON \`jars\` (\`room\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_030d33f279e559d2e8fa1c670b\` ON \`sent_mails\` (\`toAddress\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_3418d22b6295d4656133ffc324\` ON \`sent_mails\` (\`subject\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_e96d280e33207d48d968781845\` ON \`sent_mails\` (\`status\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_9471432f00d483f3160036afec\` ON \`inoculation_sessions\` (\`operatorName\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_72789c227b13be2f845b0d79d9\` ON \`retraining_requests\` (\`doneAt\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_3484ffc260f5766da37ad0493b\` ON \`retraining_requests\` (\`createdAt\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_17372f428906f8960a6499dc06\` ON \`training_records\` (\`personName\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_3e82db4c3f399fc258d017bfcc\` ON \`training_records\` (\`trainedOn\`)`);
        await queryRunner.query(`CREATE INDEX \`IDX_9f065cb68cebb9cb4b80ad30ae\` ON \`training_records\` (\`createdAt\`)`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`DROP INDEX \`IDX_9f065cb68cebb9cb4b80ad30ae\` ON \`training_records\``);
        await queryRunner.query(`DROP INDEX \`IDX_3e82db4c3f399fc258d017bfcc\` ON \`training_records\``);
        await queryRunner.query(`DROP INDEX \`IDX_17372f428906f8960a6499dc06\` ON \`training_records\``);
        await queryRunner.query(`DROP INDEX \`IDX_3484ffc260f5766da37ad0493b\` ON \`retraining_requests\``);
        await queryRunner.query(`DROP INDEX \`IDX_72789c227b13be2f845b0d79d9\` ON \`retraining_requests\``);
        await queryRunner.query(`DROP INDEX \`IDX_9471432f00d483f3160036afec\` ON \`inoculation_sessions\``);
        await queryRunner.query(`DROP INDEX \`IDX_e96d280e33207d48d968781845\` ON \`sent_mails\``);
        await queryRunner.query(`DROP INDEX \`IDX_3418d22b6295d4656133ffc324\` ON \`sent_mails\``);
        await queryRunner.query(`DROP INDEX \`IDX_030d33f279e559d2e8fa1c670b\` ON \`sent_mails\``);
        await queryRunner.query(`DROP INDEX \`IDX_a5974c0dd050208027da774b9d\` ON \`jars\``);
        await queryRunner.query(`DROP INDEX \`IDX_46835bca7fb3a5243585e319cd\` ON \`incidents\``);
        await queryRunner.query(`DROP INDEX \`IDX_6fa7e61c79777de95b6a4ecd63\` ON \`incidents\``);
        await queryRunner.query(`DROP INDEX \`IDX_ec3823825f8b286b2e1da93496\` ON \`incidents\``);
        await queryRunner.query(`DROP INDEX \`IDX_203e158505e46475eb38ce0056\` ON \`incidents\``);
        await queryRunner.query(`DROP INDEX \`IDX_1b65ba0cf683d12654a43bc8c9\` ON \`incidents\``);
        await queryRunner.query(`DROP INDEX \`IDX_9cab33aff1872299070c5d7b2f\` ON \`prep_batches\``);
        await queryRunner.query(`DROP INDEX \`IDX_e3e074e2b534696df303aa6a64\` ON \`prep_batches\``);
        await queryRunner.query(`DROP INDEX \`IDX_b6f9e7273c19bb4e90db57360f\` ON \`grain_lots\``);
        await queryRunner.query(`DROP INDEX \`IDX_863e39afb5b41c1d52ebe43d20\` ON \`grain_lots\``);
        await queryRunner.query(`DROP INDEX \`IDX_e31918854de7a8d531e7a48663\` ON \`grain_lots\``);
        await queryRunner.query(`DROP INDEX \`IDX_20f6081e71184c4d3467d6b944\` ON \`cultures\``);
        await queryRunner.query(`DROP INDEX \`IDX_1389249a8d27990851a28fc9b4\` ON \`cultures\``);
        await queryRunner.query(`DROP INDEX \`IDX_2996dfbb1107c8cba13bc3b34e\` ON \`cultures\``);
        await queryRunner.query(`DROP INDEX \`IDX_d690f3711477c0d65955403880\` ON \`cook_runs\``);
        await queryRunner.query(`DROP INDEX \`IDX_e6fcdaff6f2304fa37e4fa2820\` ON \`cook_runs\``);
        await queryRunner.query(`DROP INDEX \`IDX_854b91e5e8aceaa4b5bb7acb67\` ON \`cook_runs\``);
    }

}
