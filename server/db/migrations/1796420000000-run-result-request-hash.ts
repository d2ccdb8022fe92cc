import { MigrationInterface, QueryRunner } from 'typeorm';

/** The SHA-256 of each step result's request body, so a reused Idempotency-Key with another body is refused. */
export class RunResultRequestHash1796420000000 implements MigrationInterface {
  name = 'RunResultRequestHash1796420000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`plan_run_results\` ADD \`request_hash\` char(64) NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`plan_run_results\` DROP COLUMN \`request_hash\``);
  }
}
