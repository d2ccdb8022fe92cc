import { MigrationInterface, QueryRunner } from 'typeorm';

/** The SHA-256 of each reading's request body, so a reused Idempotency-Key with another body is refused. */
export class ReadingRequestHash1796260000000 implements MigrationInterface {
  name = 'ReadingRequestHash1796260000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`readings\` ADD \`request_hash\` char(64) NULL`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`readings\` DROP COLUMN \`request_hash\``);
  }
}
