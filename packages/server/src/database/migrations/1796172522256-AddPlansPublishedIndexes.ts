import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The library counts its published plans (`latest_published_number IS NOT NULL`) on every page.
 * Without an index on that column MariaDB read every row of `plans` to count them, also with
 * "has build reports" (`build_count > 0`, most plans); with these two the counts read an index
 * alone (EXPLAIN in `npm run bench`). `IDX_plans_build_count` stays for the "most built" order.
 */
export class AddPlansPublishedIndexes1796172522256 implements MigrationInterface {
  name = 'AddPlansPublishedIndexes1796172522256';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'ALTER TABLE `plans` ADD INDEX `IDX_plans_latest_published_number` (`latest_published_number`), ' +
        'ADD INDEX `IDX_plans_build_count_published` (`build_count`, `latest_published_number`)',
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'ALTER TABLE `plans` DROP INDEX `IDX_plans_build_count_published`, DROP INDEX `IDX_plans_latest_published_number`',
    );
  }
}
