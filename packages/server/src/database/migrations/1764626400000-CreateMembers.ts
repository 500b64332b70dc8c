import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateMembers1764626400000 implements MigrationInterface {
  name = 'CreateMembers1764626400000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE \`members\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`github_id\` bigint UNSIGNED NOT NULL,
      \`login\` varchar(39) NOT NULL,
      \`display_name\` varchar(100) NOT NULL,
      \`avatar_url\` varchar(500) NULL,
      \`email\` varchar(254) NOT NULL,
      \`role\` enum ('member', 'moderator', 'admin') NOT NULL DEFAULT 'member',
      \`suspended_at\` datetime(3) NULL,
      \`last_sign_in_at\` datetime(3) NULL,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE INDEX \`UQ_members_github_id\` (\`github_id\`),
      PRIMARY KEY (\`id\`)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `members`');
  }
}
