import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * "Best rated" orders by rating, then by the number of ratings (then id). With the rating alone in
 * the index MariaDB sorted every matching plan, all of them for the unfiltered library (EXPLAIN in
 * `npm run bench`); with both columns it walks the index and stops at the page's end. The
 * minimum-rating filter uses the same index's first column.
 */
export class AddPlansRatingOrderIndex1796174983124 implements MigrationInterface {
  name = 'AddPlansRatingOrderIndex1796174983124';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'ALTER TABLE `plans` DROP INDEX `IDX_plans_rating`, ADD INDEX `IDX_plans_rating` (`rating_average`, `rating_count`)',
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      'ALTER TABLE `plans` DROP INDEX `IDX_plans_rating`, ADD INDEX `IDX_plans_rating` (`rating_average`)',
    );
  }
}
