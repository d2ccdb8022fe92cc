import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Editors' CSV import with preview (written by hand, not generated):
 * - import_batches learns who committed it, with which reason, and the file size;
 * - import_batch_rows keeps every row of a previewed file with its planned action, so the
 *   commit applies exactly what the preview showed, set-based inside MariaDB (no entity:
 *   the importer reads and writes it with multi-row SQL, see import-stage.ts). The *_ord
 *   columns number the batch's distinct models, components and sources, and `firsts`
 *   marks each one's first row, so the commit joins on small integers instead of long keys;
 *   `create_ord` numbers the created rows, which become specs with consecutive ids;
 * - specs.source_page widens to the 200 characters the CSV format allows.
 */
export class CurationImports1796176000000 implements MigrationInterface {
  name = 'CurationImports1796176000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`import_batches\`
      ADD \`file_size\` int NOT NULL DEFAULT 0,
      ADD \`committed_by_id\` int NULL,
      ADD \`committed_by_name\` varchar(120) NULL,
      ADD \`reason\` varchar(500) NULL,
      ADD INDEX \`idx_import_batches_created\` (\`created_at\`)`);
    await queryRunner.query(`ALTER TABLE \`specs\` MODIFY \`source_page\` varchar(200) NULL`);
    await queryRunner.query(`CREATE TABLE \`import_batch_rows\` (
      \`batch_id\` int NOT NULL,
      \`line\` int NOT NULL,
      \`action\` enum ('create', 'update', 'unchanged', 'rejected') NOT NULL,
      \`spec_id\` int NULL,
      \`base_version\` int NULL,
      \`make\` varchar(120) NULL,
      \`model\` varchar(120) NULL,
      \`year_from\` smallint NULL,
      \`year_to\` smallint NULL,
      \`variant\` varchar(120) NULL,
      \`component\` varchar(120) NULL,
      \`parameter\` varchar(120) NULL,
      \`make_key\` varchar(120) NULL,
      \`model_key\` varchar(400) NULL,
      \`component_key\` varchar(120) NULL,
      \`parameter_key\` varchar(120) NULL,
      \`source_key\` varchar(420) NULL,
      \`model_ord\` int NULL,
      \`component_ord\` int NULL,
      \`source_ord\` int NULL,
      \`firsts\` tinyint NOT NULL DEFAULT 0,
      \`create_ord\` int NULL,
      \`quantity_kind\` enum ('resistance', 'voltage', 'current', 'length') NULL,
      \`min_value\` double NULL,
      \`nominal_value\` double NULL,
      \`max_value\` double NULL,
      \`unit\` varchar(8) NULL,
      \`ref_temp_c\` double NULL,
      \`material\` enum ('copper', 'none') NULL,
      \`test_points\` text NULL,
      \`conditions\` text NULL,
      \`notes\` text NULL,
      \`source_title\` varchar(200) NULL,
      \`source_edition\` varchar(200) NULL,
      \`source_page\` varchar(200) NULL,
      \`source_url\` varchar(500) NULL,
      \`changes\` longtext NULL,
      \`problems\` longtext NULL,
      PRIMARY KEY (\`batch_id\`, \`line\`),
      INDEX \`idx_import_batch_rows_action\` (\`batch_id\`, \`action\`, \`line\`),
      INDEX \`idx_import_batch_rows_firsts\` (\`batch_id\`, \`firsts\`),
      CONSTRAINT \`fk_import_batch_rows_batch\` FOREIGN KEY (\`batch_id\`) REFERENCES \`import_batches\` (\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE \`import_batch_rows\``);
    await queryRunner.query(`ALTER TABLE \`specs\` MODIFY \`source_page\` varchar(40) NULL`);
    await queryRunner.query(`ALTER TABLE \`import_batches\`
      DROP INDEX \`idx_import_batches_created\`,
      DROP COLUMN \`reason\`,
      DROP COLUMN \`committed_by_name\`,
      DROP COLUMN \`committed_by_id\`,
      DROP COLUMN \`file_size\``);
  }
}
