import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Corrections can be about a test plan (kind 'plan_change'): the plan they change, and no
 * model for a generic plan. The proposed plan fields stay in the `proposed` JSON column.
 */
export class PlanCorrections1796410000000 implements MigrationInterface {
  name = 'PlanCorrections1796410000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`corrections\` MODIFY \`kind\` enum ('change', 'new_spec', 'new_component', 'plan_change') NOT NULL, MODIFY \`model_id\` int NULL, ADD \`plan_id\` int NULL`,
    );
    await queryRunner.query(`CREATE INDEX \`IDX_ab81e19627775eeb2af0d7f622\` ON \`corrections\` (\`plan_id\`)`);
  }

  /** Plan proposals have nowhere to go in the older table: they are deleted. */
  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM \`corrections\` WHERE \`kind\` = 'plan_change' OR \`model_id\` IS NULL`);
    await queryRunner.query(`DROP INDEX \`IDX_ab81e19627775eeb2af0d7f622\` ON \`corrections\``);
    await queryRunner.query(
      `ALTER TABLE \`corrections\` DROP COLUMN \`plan_id\`, MODIFY \`model_id\` int NOT NULL, MODIFY \`kind\` enum ('change', 'new_spec', 'new_component') NOT NULL`,
    );
  }
}
