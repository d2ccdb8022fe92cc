import { MigrationInterface, QueryRunner } from 'typeorm';

export class JobSheets1796177360483 implements MigrationInterface {
  name = 'JobSheets1796177360483';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`jobs\` (\`id\` int NOT NULL AUTO_INCREMENT, \`owner_id\` int NOT NULL, \`model_id\` int NULL, \`machine_label\` varchar(160) NOT NULL DEFAULT '', \`machine_id\` varchar(40) NOT NULL DEFAULT '', \`customer_ref\` varchar(80) NOT NULL DEFAULT '', \`notes\` text NULL, \`status\` enum ('open', 'closed') NOT NULL DEFAULT 'open', \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), INDEX \`ix_jobs_owner_created\` (\`owner_id\`, \`created_at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`readings\` (\`id\` int NOT NULL AUTO_INCREMENT, \`job_id\` int NOT NULL, \`spec_id\` int NULL, \`spec_version\` int NULL, \`label\` varchar(200) NOT NULL, \`component_name\` varchar(120) NOT NULL DEFAULT '', \`spec_limits\` json NOT NULL, \`inputs\` json NOT NULL, \`value\` double NOT NULL, \`unit\` varchar(8) NOT NULL, \`expanded_uncertainty\` double NULL, \`conformance_probability\` double NULL, \`verdict\` enum ('pass', 'marginal', 'fail') NOT NULL, \`reason\` text NOT NULL, \`steps\` json NOT NULL, \`zones\` json NOT NULL, \`idempotency_key\` varchar(80) NOT NULL, \`superseded_by\` int NULL, \`taken_at\` datetime(3) NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_45377d9c50f9a727082996d47d\` (\`job_id\`), UNIQUE INDEX \`uq_readings_job_key\` (\`job_id\`, \`idempotency_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`uq_readings_job_key\` ON \`readings\``);
    await queryRunner.query(`DROP INDEX \`IDX_45377d9c50f9a727082996d47d\` ON \`readings\``);
    await queryRunner.query(`DROP TABLE \`readings\``);
    await queryRunner.query(`DROP INDEX \`ix_jobs_owner_created\` ON \`jobs\``);
    await queryRunner.query(`DROP TABLE \`jobs\``);
  }
}
