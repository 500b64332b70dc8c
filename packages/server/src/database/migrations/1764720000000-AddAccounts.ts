import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sessions with rotating refresh tokens, the audit log of role and status changes, and member settings. */
export class AddAccounts1764720000000 implements MigrationInterface {
  name = 'AddAccounts1764720000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE \`members\`
      ADD \`display_name_chosen_at\` datetime(3) NULL AFTER \`display_name\`,
      ADD \`units\` enum ('mm', 'in') NOT NULL DEFAULT 'mm' AFTER \`last_sign_in_at\`,
      ADD \`notify_revision_decided\` tinyint NOT NULL DEFAULT 1 AFTER \`units\`,
      ADD \`notify_build_reported\` tinyint NOT NULL DEFAULT 1 AFTER \`notify_revision_decided\`,
      ADD \`notify_plan_adapted\` tinyint NOT NULL DEFAULT 1 AFTER \`notify_build_reported\`,
      ADD \`notify_flag_resolved\` tinyint NOT NULL DEFAULT 1 AFTER \`notify_plan_adapted\`,
      ADD INDEX \`IDX_members_login\` (\`login\`)`);
    await queryRunner.query(`CREATE TABLE \`sessions\` (
      \`id\` varchar(36) NOT NULL,
      \`member_id\` int UNSIGNED NOT NULL,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      \`ended_at\` datetime(3) NULL,
      \`end_reason\` enum ('signed_out', 'refresh_reused', 'member_suspended') NULL,
      INDEX \`IDX_sessions_member\` (\`member_id\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_sessions_member\` FOREIGN KEY (\`member_id\`) REFERENCES \`members\` (\`id\`) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`CREATE TABLE \`refresh_tokens\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`session_id\` char(36) NOT NULL,
      \`token_hash\` char(64) NOT NULL,
      \`expires_at\` datetime(3) NOT NULL,
      \`replaced_at\` datetime(3) NULL,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE INDEX \`UQ_refresh_tokens_hash\` (\`token_hash\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_refresh_tokens_session\` FOREIGN KEY (\`session_id\`) REFERENCES \`sessions\` (\`id\`) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`CREATE TABLE \`audit_log\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`actor_id\` int UNSIGNED NULL,
      \`subject_id\` int UNSIGNED NOT NULL,
      \`action\` enum ('moderator_granted', 'moderator_revoked', 'admin_granted', 'admin_revoked', 'suspended', 'restored') NOT NULL,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      INDEX \`IDX_audit_log_subject\` (\`subject_id\`),
      INDEX \`IDX_audit_log_created\` (\`created_at\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_audit_log_actor\` FOREIGN KEY (\`actor_id\`) REFERENCES \`members\` (\`id\`) ON DELETE SET NULL,
      CONSTRAINT \`FK_audit_log_subject\` FOREIGN KEY (\`subject_id\`) REFERENCES \`members\` (\`id\`) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `audit_log`');
    await queryRunner.query('DROP TABLE `refresh_tokens`');
    await queryRunner.query('DROP TABLE `sessions`');
    await queryRunner.query(`ALTER TABLE \`members\`
      DROP INDEX \`IDX_members_login\`,
      DROP COLUMN \`notify_flag_resolved\`,
      DROP COLUMN \`notify_plan_adapted\`,
      DROP COLUMN \`notify_build_reported\`,
      DROP COLUMN \`notify_revision_decided\`,
      DROP COLUMN \`units\`,
      DROP COLUMN \`display_name_chosen_at\``);
  }
}
