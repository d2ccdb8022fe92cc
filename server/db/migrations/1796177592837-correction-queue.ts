import { MigrationInterface, QueryRunner } from 'typeorm';

export class CorrectionQueue1796177592837 implements MigrationInterface {
  name = 'CorrectionQueue1796177592837';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`corrections\` (\`id\` int NOT NULL AUTO_INCREMENT, \`kind\` enum ('change', 'new_spec', 'new_component') NOT NULL, \`spec_id\` int NULL, \`component_id\` int NULL, \`model_id\` int NOT NULL, \`proposer_id\` int NOT NULL, \`proposed\` json NOT NULL, \`citation\` json NOT NULL, \`rationale\` text NOT NULL, \`status\` enum ('pending', 'accepted', 'rejected', 'withdrawn') NOT NULL DEFAULT 'pending', \`base_version\` int NULL, \`reviewer_id\` int NULL, \`reviewer_name\` varchar(80) NULL, \`decision_note\` text NULL, \`decided_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), INDEX \`IDX_1bbb853beae56a4acb8cd19482\` (\`spec_id\`), INDEX \`IDX_3c13b57b53de11171269e3466f\` (\`model_id\`), INDEX \`IDX_e4fa69b2810d74d8127e8da153\` (\`proposer_id\`), INDEX \`ix_corrections_status_created\` (\`status\`, \`created_at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(`DROP INDEX \`ix_jobs_owner_created\` ON \`jobs\``);
    await queryRunner.query(`CREATE INDEX \`ix_jobs_owner_created\` ON \`jobs\` (\`owner_id\`, \`created_at\`)`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`ix_jobs_owner_created\` ON \`jobs\``);
    await queryRunner.query(`CREATE INDEX \`ix_jobs_owner_created\` ON \`jobs\` (\`owner_id\`, \`created_at\`)`);
    await queryRunner.query(`DROP INDEX \`ix_corrections_status_created\` ON \`corrections\``);
    await queryRunner.query(`DROP INDEX \`IDX_e4fa69b2810d74d8127e8da153\` ON \`corrections\``);
    await queryRunner.query(`DROP INDEX \`IDX_3c13b57b53de11171269e3466f\` ON \`corrections\``);
    await queryRunner.query(`DROP INDEX \`IDX_1bbb853beae56a4acb8cd19482\` ON \`corrections\``);
    await queryRunner.query(`DROP TABLE \`corrections\``);
  }
}
