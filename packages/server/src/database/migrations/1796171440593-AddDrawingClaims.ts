import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Drawings get a claim (token and lease) and an attempt count, so that any replica can take on an
 * analysis another one left unfinished, never two at once, and a drawing that keeps stopping its
 * replica ends failed instead of being tried for ever.
 */
export class AddDrawingClaims1796171440593 implements MigrationInterface {
  name = 'AddDrawingClaims1796171440593';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`drawings\`
        ADD \`attempts\` int UNSIGNED NOT NULL DEFAULT 0,
        ADD \`claim_token\` char(36) NULL,
        ADD \`lease_until\` datetime(3) NULL,
        ADD INDEX \`IDX_drawings_status_lease\` (\`status\`, \`lease_until\`)`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE \`drawings\`
        DROP INDEX \`IDX_drawings_status_lease\`,
        DROP COLUMN \`lease_until\`,
        DROP COLUMN \`claim_token\`,
        DROP COLUMN \`attempts\``,
    );
  }
}
