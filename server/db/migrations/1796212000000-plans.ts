import { MigrationInterface, QueryRunner } from 'typeorm';

export class Plans1796212000000 implements MigrationInterface {
  name = 'Plans1796212000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`plans\` (\`id\` int NOT NULL AUTO_INCREMENT, \`title\` varchar(160) NOT NULL, \`symptom\` varchar(200) NOT NULL, \`system\` enum ('ignition', 'charging', 'starting', 'fuel', 'lighting') NOT NULL, \`model_id\` int NULL, \`status\` enum ('published', 'draft') NOT NULL DEFAULT 'published', \`citation\` json NOT NULL, \`steps\` json NOT NULL, \`version\` int NOT NULL DEFAULT '1', \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), INDEX \`IDX_b43c64946dead2db7db9f516f4\` (\`model_id\`), INDEX \`ix_plans_system_status\` (\`system\`, \`status\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`plan_revisions\` (\`id\` int NOT NULL AUTO_INCREMENT, \`plan_id\` int NOT NULL, \`version\` int NOT NULL, \`snapshot\` json NOT NULL, \`changed_fields\` json NOT NULL, \`author_id\` int NULL, \`author_name\` varchar(120) NOT NULL, \`reason\` varchar(500) NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`uq_plan_revisions_plan_version\` (\`plan_id\`, \`version\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`plan_runs\` (\`id\` int NOT NULL AUTO_INCREMENT, \`job_id\` int NOT NULL, \`plan_id\` int NOT NULL, \`plan_version\` int NOT NULL, \`title\` varchar(160) NOT NULL, \`symptom\` varchar(200) NOT NULL, \`system\` varchar(20) NOT NULL, \`steps\` json NOT NULL, \`current_step\` varchar(60) NULL, \`status\` enum ('active', 'concluded') NOT NULL DEFAULT 'active', \`finding\` json NULL, \`started_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), INDEX \`ix_plan_runs_job\` (\`job_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`plan_run_results\` (\`id\` int NOT NULL AUTO_INCREMENT, \`run_id\` int NOT NULL, \`step_id\` varchar(60) NOT NULL, \`outcome\` varchar(60) NOT NULL, \`verdict\` enum ('pass', 'marginal', 'fail') NULL, \`reason\` text NOT NULL, \`reading_id\` int NULL, \`skip_reason\` varchar(300) NULL, \`idempotency_key\` varchar(80) NOT NULL, \`undone\` tinyint NOT NULL DEFAULT 0, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`uq_plan_run_results_key\` (\`run_id\`, \`idempotency_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`component_connectors\` (\`component_id\` int NOT NULL, \`connector\` json NOT NULL, \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), PRIMARY KEY (\`component_id\`)) ENGINE=InnoDB`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE \`component_connectors\``);
    await queryRunner.query(`DROP INDEX \`uq_plan_run_results_key\` ON \`plan_run_results\``);
    await queryRunner.query(`DROP TABLE \`plan_run_results\``);
    await queryRunner.query(`DROP INDEX \`ix_plan_runs_job\` ON \`plan_runs\``);
    await queryRunner.query(`DROP TABLE \`plan_runs\``);
    await queryRunner.query(`DROP INDEX \`uq_plan_revisions_plan_version\` ON \`plan_revisions\``);
    await queryRunner.query(`DROP TABLE \`plan_revisions\``);
    await queryRunner.query(`DROP INDEX \`ix_plans_system_status\` ON \`plans\``);
    await queryRunner.query(`DROP INDEX \`IDX_b43c64946dead2db7db9f516f4\` ON \`plans\``);
    await queryRunner.query(`DROP TABLE \`plans\``);
  }
}
