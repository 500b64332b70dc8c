import type { MigrationInterface, QueryRunner } from 'typeorm';

const MEMBER_ACTIONS = `'moderator_granted', 'moderator_revoked', 'admin_granted', 'admin_revoked', 'suspended', 'restored'`;
const REVIEW_ACTIONS = `'revision_published', 'revision_sent_back', 'revision_declined', 'revision_hidden', 'revision_unhidden'`;

/** The review desk's decisions on revisions, and review decisions in the audit log (with the revision they were about). */
export class AddReviewDecisions1796171681558 implements MigrationInterface {
  name = 'AddReviewDecisions1796171681558';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE \`review_decisions\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`revision_id\` int UNSIGNED NOT NULL,
      \`moderator_id\` int UNSIGNED NULL,
      \`decision\` enum ('publish', 'send-back', 'decline', 'hide', 'unhide') NOT NULL,
      \`notes\` text NOT NULL,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      INDEX \`IDX_review_decisions_revision\` (\`revision_id\`, \`created_at\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_review_decisions_revision\` FOREIGN KEY (\`revision_id\`) REFERENCES \`revisions\` (\`id\`) ON DELETE CASCADE,
      CONSTRAINT \`FK_review_decisions_moderator\` FOREIGN KEY (\`moderator_id\`) REFERENCES \`members\` (\`id\`) ON DELETE SET NULL
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(
      `ALTER TABLE \`audit_log\` MODIFY \`action\` enum (${MEMBER_ACTIONS}, ${REVIEW_ACTIONS}) NOT NULL`,
    );
    await queryRunner.query(`ALTER TABLE \`audit_log\` ADD \`revision_id\` int UNSIGNED NULL AFTER \`action\``);
    await queryRunner.query(
      `ALTER TABLE \`audit_log\` ADD CONSTRAINT \`FK_audit_log_revision\` FOREIGN KEY (\`revision_id\`) REFERENCES \`revisions\` (\`id\`) ON DELETE SET NULL`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`audit_log\` DROP FOREIGN KEY \`FK_audit_log_revision\``);
    await queryRunner.query(`ALTER TABLE \`audit_log\` DROP COLUMN \`revision_id\``);
    // Review entries cannot be kept under the older list of actions.
    await queryRunner.query(`DELETE FROM \`audit_log\` WHERE \`action\` IN (${REVIEW_ACTIONS})`);
    await queryRunner.query(`ALTER TABLE \`audit_log\` MODIFY \`action\` enum (${MEMBER_ACTIONS}) NOT NULL`);
    await queryRunner.query('DROP TABLE `review_decisions`');
  }
}
