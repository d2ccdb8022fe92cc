import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * library_changes: one row per spec change, written in the change's own transaction, so
 * every server process can follow the library by polling the last id (search index,
 * spec-card cache). Rows are pruned after a day by the staged-rows cleanup.
 */
export class LibraryChanges1796291400000 implements MigrationInterface {
  name = 'LibraryChanges1796291400000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE IF NOT EXISTS \`library_changes\` (\`id\` bigint NOT NULL AUTO_INCREMENT, \`spec_id\` int NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`ix_library_changes_created\` (\`created_at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `library_changes`');
  }
}
