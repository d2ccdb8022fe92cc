import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A job started offline is sent with an Idempotency-Key, kept beside the SHA-256 of its
 * body: a resend lands once per owner, and a reused key with another body is refused.
 */
export class JobIdempotency1796400000000 implements MigrationInterface {
  name = 'JobIdempotency1796400000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`jobs\` ADD \`idempotency_key\` varchar(80) NULL, ADD \`request_hash\` char(64) NULL`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX \`uq_jobs_owner_key\` ON \`jobs\` (\`owner_id\`, \`idempotency_key\`)`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`uq_jobs_owner_key\` ON \`jobs\``);
    await queryRunner.query(`ALTER TABLE \`jobs\` DROP COLUMN \`request_hash\`, DROP COLUMN \`idempotency_key\``);
  }
}
