import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Parts get their own `updated_at`, so that two tabs editing the same part cannot overwrite each other. */
export class AddPartUpdatedAt1796171415305 implements MigrationInterface {
  name = 'AddPartUpdatedAt1796171415305';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`parts\` ADD \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`parts\` DROP COLUMN \`updated_at\``);
  }
}
