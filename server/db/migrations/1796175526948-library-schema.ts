import { MigrationInterface, QueryRunner } from 'typeorm';

export class LibrarySchema1796175526948 implements MigrationInterface {
  name = 'LibrarySchema1796175526948';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE \`makes\` (\`id\` int NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`name_key\` varchar(120) NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_3101ff2acf63aff2fd689c9a04\` (\`name_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`vehicle_models\` (\`id\` int NOT NULL AUTO_INCREMENT, \`make_id\` int NOT NULL, \`name\` varchar(120) NOT NULL, \`year_from\` smallint NOT NULL, \`year_to\` smallint NULL, \`variant\` varchar(120) NOT NULL DEFAULT '', \`model_key\` varchar(400) NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_fdaad754d775047ad6e37c53ee\` (\`make_id\`), UNIQUE INDEX \`IDX_188ae780c064cb13ddfd74127c\` (\`model_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`components\` (\`id\` int NOT NULL AUTO_INCREMENT, \`model_id\` int NOT NULL, \`name\` varchar(120) NOT NULL, \`name_key\` varchar(120) NOT NULL, \`location_notes\` text NULL, \`connector_notes\` text NULL, UNIQUE INDEX \`uq_components_model_name\` (\`model_id\`, \`name_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`sources\` (\`id\` int NOT NULL AUTO_INCREMENT, \`title\` varchar(200) NOT NULL, \`edition\` varchar(200) NOT NULL DEFAULT '', \`publisher\` varchar(200) NULL, \`year\` smallint NULL, \`kind\` enum ('service_manual', 'bulletin', 'datasheet', 'handbook') NOT NULL DEFAULT 'service_manual', \`url\` varchar(500) NULL, \`source_key\` varchar(420) NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`IDX_f05160cd82e8cbffc0aa12b0ca\` (\`source_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`specs\` (\`id\` int NOT NULL AUTO_INCREMENT, \`component_id\` int NOT NULL, \`parameter\` varchar(120) NOT NULL, \`parameter_key\` varchar(120) NOT NULL, \`quantity_kind\` enum ('resistance', 'voltage', 'current', 'length') NOT NULL, \`min_value\` double NULL, \`nominal_value\` double NULL, \`max_value\` double NULL, \`unit\` varchar(8) NOT NULL, \`ref_temp_c\` double NULL, \`material\` enum ('copper', 'none') NOT NULL DEFAULT 'none', \`test_points\` text NULL, \`conditions\` text NULL, \`notes\` text NULL, \`source_id\` int NULL, \`source_page\` varchar(40) NULL, \`status\` enum ('published', 'draft') NOT NULL DEFAULT 'published', \`version\` int NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), INDEX \`IDX_5bbdcc2a2cdb767b57a1454bd6\` (\`source_id\`), UNIQUE INDEX \`uq_specs_component_parameter\` (\`component_id\`, \`parameter_key\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`spec_revisions\` (\`id\` int NOT NULL AUTO_INCREMENT, \`spec_id\` int NOT NULL, \`version\` int NOT NULL, \`snapshot\` json NOT NULL, \`changed_fields\` json NOT NULL, \`author_id\` int NULL, \`author_name\` varchar(120) NOT NULL, \`reason\` varchar(500) NOT NULL, \`origin\` enum ('edit', 'import', 'correction', 'revert') NOT NULL, \`origin_ref\` varchar(60) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), INDEX \`IDX_137f2ba0d4b8f52618cdab55b4\` (\`author_id\`), UNIQUE INDEX \`uq_spec_revisions_spec_version\` (\`spec_id\`, \`version\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `CREATE TABLE \`import_batches\` (\`id\` int NOT NULL AUTO_INCREMENT, \`file_name\` varchar(255) NOT NULL, \`sha256\` char(64) NOT NULL, \`uploader_id\` int NULL, \`uploader_name\` varchar(120) NOT NULL, \`counts\` json NOT NULL, \`row_errors\` json NOT NULL, \`status\` enum ('previewed', 'committed', 'failed') NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`committed_at\` datetime(3) NULL, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await queryRunner.query(
      `ALTER TABLE \`vehicle_models\` ADD CONSTRAINT \`FK_fdaad754d775047ad6e37c53ee4\` FOREIGN KEY (\`make_id\`) REFERENCES \`makes\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE \`components\` ADD CONSTRAINT \`FK_0c0336c610df79c50c46938ba9d\` FOREIGN KEY (\`model_id\`) REFERENCES \`vehicle_models\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE \`specs\` ADD CONSTRAINT \`FK_b49431c99cb1900d115c8fe3ad7\` FOREIGN KEY (\`component_id\`) REFERENCES \`components\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE \`specs\` ADD CONSTRAINT \`FK_5bbdcc2a2cdb767b57a1454bd67\` FOREIGN KEY (\`source_id\`) REFERENCES \`sources\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE \`spec_revisions\` ADD CONSTRAINT \`FK_4737bede4b6b45de51e0176da1a\` FOREIGN KEY (\`spec_id\`) REFERENCES \`specs\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`spec_revisions\` DROP FOREIGN KEY \`FK_4737bede4b6b45de51e0176da1a\``);
    await queryRunner.query(`ALTER TABLE \`specs\` DROP FOREIGN KEY \`FK_5bbdcc2a2cdb767b57a1454bd67\``);
    await queryRunner.query(`ALTER TABLE \`specs\` DROP FOREIGN KEY \`FK_b49431c99cb1900d115c8fe3ad7\``);
    await queryRunner.query(`ALTER TABLE \`components\` DROP FOREIGN KEY \`FK_0c0336c610df79c50c46938ba9d\``);
    await queryRunner.query(`ALTER TABLE \`vehicle_models\` DROP FOREIGN KEY \`FK_fdaad754d775047ad6e37c53ee4\``);
    await queryRunner.query(`DROP TABLE \`import_batches\``);
    await queryRunner.query(`DROP INDEX \`uq_spec_revisions_spec_version\` ON \`spec_revisions\``);
    await queryRunner.query(`DROP INDEX \`IDX_137f2ba0d4b8f52618cdab55b4\` ON \`spec_revisions\``);
    await queryRunner.query(`DROP TABLE \`spec_revisions\``);
    await queryRunner.query(`DROP INDEX \`uq_specs_component_parameter\` ON \`specs\``);
    await queryRunner.query(`DROP INDEX \`IDX_5bbdcc2a2cdb767b57a1454bd6\` ON \`specs\``);
    await queryRunner.query(`DROP TABLE \`specs\``);
    await queryRunner.query(`DROP INDEX \`IDX_f05160cd82e8cbffc0aa12b0ca\` ON \`sources\``);
    await queryRunner.query(`DROP TABLE \`sources\``);
    await queryRunner.query(`DROP INDEX \`uq_components_model_name\` ON \`components\``);
    await queryRunner.query(`DROP TABLE \`components\``);
    await queryRunner.query(`DROP INDEX \`IDX_188ae780c064cb13ddfd74127c\` ON \`vehicle_models\``);
    await queryRunner.query(`DROP INDEX \`IDX_fdaad754d775047ad6e37c53ee\` ON \`vehicle_models\``);
    await queryRunner.query(`DROP TABLE \`vehicle_models\``);
    await queryRunner.query(`DROP INDEX \`IDX_3101ff2acf63aff2fd689c9a04\` ON \`makes\``);
    await queryRunner.query(`DROP TABLE \`makes\``);
  }
}
