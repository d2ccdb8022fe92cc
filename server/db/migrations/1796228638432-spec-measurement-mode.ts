import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The meter mode of a check, its near-limit band in the spec's unit and the engine speed it
 * is made at (lib/contracts/spec-fields.ts: mode, nearLimit, engineRpm), on specs and on the
 * staged import rows. All nullable: an empty mode is decided from the parameter and unit.
 */
export class SpecMeasurementMode1796228638432 implements MigrationInterface {
  name = 'SpecMeasurementMode1796228638432';

  public async up(queryRunner: QueryRunner): Promise<void> {
    const mode = `enum ('dc_voltage', 'ac_voltage', 'peak_voltage', 'resistance', 'diode_forward', 'continuity', 'current') NULL`;
    for (const table of ['specs', 'import_batch_rows']) {
      await queryRunner.query(
        `ALTER TABLE \`${table}\` ADD \`mode\` ${mode} AFTER \`unit\`, ADD \`near_limit\` double NULL AFTER \`mode\`, ADD \`engine_rpm\` double NULL AFTER \`near_limit\``,
      );
    }
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['import_batch_rows', 'specs']) {
      await queryRunner.query(
        `ALTER TABLE \`${table}\` DROP COLUMN \`engine_rpm\`, DROP COLUMN \`near_limit\`, DROP COLUMN \`mode\``,
      );
    }
  }
}
