import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A shop profile per member: kerf, edge trim, sheet and bar sizes, milling allowance, prices. */
export class AddShopProfiles1796171748797 implements MigrationInterface {
  name = 'AddShopProfiles1796171748797';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE \`shop_profiles\` (
      \`member_id\` int UNSIGNED NOT NULL,
      \`kerf\` double NOT NULL,
      \`edge_trim\` double NOT NULL,
      \`sheets\` json NOT NULL,
      \`bar_lengths\` json NOT NULL,
      \`solid_allowance\` json NOT NULL,
      \`currency\` char(3) NOT NULL,
      \`prices\` json NOT NULL,
      \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (\`member_id\`),
      CONSTRAINT \`FK_shop_profiles_member\` FOREIGN KEY (\`member_id\`) REFERENCES \`members\` (\`id\`) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `shop_profiles`');
  }
}
