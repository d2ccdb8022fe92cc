import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Rate-limit counters shared by every replica (rate-limiter-flexible's MySQL store; its
 * own layout: key, points, expire in epoch ms). No entity: only the store reads it.
 */
export class RateLimits1796299100000 implements MigrationInterface {
  name = 'RateLimits1796299100000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`rate_limits\` (\`key\` varchar(255) NOT NULL, \`points\` int NOT NULL DEFAULT 0, \`expire\` bigint UNSIGNED NULL, INDEX \`ix_rate_limits_expire\` (\`expire\`), PRIMARY KEY (\`key\`)) ENGINE=InnoDB`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE \`rate_limits\``);
  }
}
