import { MigrationInterface, QueryRunner } from 'typeorm';

export class Accounts1796176876877 implements MigrationInterface {
  name = 'Accounts1796176876877';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`users\` (\`id\` int NOT NULL AUTO_INCREMENT, \`email\` varchar(254) NOT NULL, \`email_key\` varchar(254) NOT NULL, \`display_name\` varchar(80) NOT NULL, \`password_hash\` varchar(100) NOT NULL, \`role\` enum ('contributor', 'editor', 'admin') NOT NULL DEFAULT 'contributor', \`email_verified_at\` datetime(3) NULL, \`disabled_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_d87b0da10cbb5c0bdb73164f48\` (\`email_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`user_audit\` (\`id\` int NOT NULL AUTO_INCREMENT, \`user_id\` int NOT NULL, \`actor_id\` int NULL, \`actor_name\` varchar(80) NOT NULL, \`action\` varchar(40) NOT NULL, \`from_value\` varchar(80) NULL, \`to_value\` varchar(80) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_1fba64fee274cbbcb82bceb05e\` (\`user_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`refresh_tokens\` (\`id\` int NOT NULL AUTO_INCREMENT, \`user_id\` int NOT NULL, \`family_id\` char(36) NOT NULL, \`token_hash\` char(64) NOT NULL, \`expires_at\` datetime(3) NOT NULL, \`replaced_at\` datetime(3) NULL, \`revoked_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_3ddc983c5f7bcf132fd8732c3f\` (\`user_id\`), INDEX \`IDX_d5e27da0cd39bc3bb2811fc8ba\` (\`family_id\`), UNIQUE INDEX \`IDX_a7838d2ba25be1342091b6695f\` (\`token_hash\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`email_tokens\` (\`id\` int NOT NULL AUTO_INCREMENT, \`user_id\` int NOT NULL, \`purpose\` enum ('verify', 'reset') NOT NULL, \`token_hash\` char(64) NOT NULL, \`expires_at\` datetime(3) NOT NULL, \`used_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_018295f41628791c301bfe8b62\` (\`user_id\`), UNIQUE INDEX \`IDX_8acb431edfc9f9d0e77741468e\` (\`token_hash\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`outbox_messages\` (\`id\` int NOT NULL AUTO_INCREMENT, \`to_address\` varchar(254) NOT NULL, \`subject\` varchar(200) NOT NULL, \`body_text\` text NOT NULL, \`attempts\` int NOT NULL DEFAULT '0', \`last_error\` varchar(500) NULL, \`next_attempt_at\` datetime(3) NOT NULL, \`sent_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`ix_outbox_due\` (\`sent_at\`, \`next_attempt_at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP INDEX \`ix_outbox_due\` ON \`outbox_messages\``);
    await queryRunner.query(`DROP TABLE \`outbox_messages\``);
    await queryRunner.query(`DROP INDEX \`IDX_8acb431edfc9f9d0e77741468e\` ON \`email_tokens\``);
    await queryRunner.query(`DROP INDEX \`IDX_018295f41628791c301bfe8b62\` ON \`email_tokens\``);
    await queryRunner.query(`DROP TABLE \`email_tokens\``);
    await queryRunner.query(`DROP INDEX \`IDX_a7838d2ba25be1342091b6695f\` ON \`refresh_tokens\``);
    await queryRunner.query(`DROP INDEX \`IDX_d5e27da0cd39bc3bb2811fc8ba\` ON \`refresh_tokens\``);
    await queryRunner.query(`DROP INDEX \`IDX_3ddc983c5f7bcf132fd8732c3f\` ON \`refresh_tokens\``);
    await queryRunner.query(`DROP TABLE \`refresh_tokens\``);
    await queryRunner.query(`DROP INDEX \`IDX_1fba64fee274cbbcb82bceb05e\` ON \`user_audit\``);
    await queryRunner.query(`DROP TABLE \`user_audit\``);
    await queryRunner.query(`DROP INDEX \`IDX_d87b0da10cbb5c0bdb73164f48\` ON \`users\``);
    await queryRunner.query(`DROP TABLE \`users\``);
  }
}
