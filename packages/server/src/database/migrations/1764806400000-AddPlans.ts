import type { MigrationInterface, QueryRunner } from 'typeorm';

const CATEGORIES = `'sled', 'fence', 'taper-jig', 'circle-jig', 'drilling-guide', 'router-jig', 'indexing-jig', 'clamping', 'sharpening', 'other'`;
const LICENCES = `'CC-BY-4.0', 'CC-BY-SA-4.0', 'CC0-1.0', 'CERN-OHL-P-2.0', 'CERN-OHL-W-2.0', 'CERN-OHL-S-2.0'`;
const TOOLS = `'table-saw', 'router-table', 'band-saw', 'drill-press', 'hand-drill', 'router', 'jigsaw', 'random-orbit-sander', '3d-printer', 'soldering-iron', 'hand-plane', 'hand-saw'`;
const TABLE_OPTIONS = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/** Plans with their tools, revisions, drawings, parts and attachments; the library's indexes and FULLTEXT search. */
export class AddPlans1764806400000 implements MigrationInterface {
  name = 'AddPlans1764806400000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE \`plans\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`slug\` varchar(80) NOT NULL,
      \`owner_id\` int UNSIGNED NOT NULL,
      \`title\` varchar(120) NOT NULL,
      \`summary\` varchar(500) NOT NULL,
      \`category\` enum (${CATEGORIES}) NOT NULL,
      \`tags\` json NOT NULL,
      \`tags_text\` varchar(1000) NOT NULL DEFAULT '',
      \`licence\` enum (${LICENCES}) NOT NULL,
      \`motorised\` tinyint NOT NULL DEFAULT 0,
      \`latest_published_number\` int UNSIGNED NULL,
      \`latest_published_at\` datetime(3) NULL,
      \`search_notes\` mediumtext NOT NULL,
      \`thumbnail\` json NULL,
      \`rating_average\` decimal(3,2) NOT NULL DEFAULT 0,
      \`rating_count\` int UNSIGNED NOT NULL DEFAULT 0,
      \`build_count\` int UNSIGNED NOT NULL DEFAULT 0,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE INDEX \`UQ_plans_slug\` (\`slug\`),
      INDEX \`IDX_plans_owner\` (\`owner_id\`),
      INDEX \`IDX_plans_category\` (\`category\`),
      INDEX \`IDX_plans_licence\` (\`licence\`),
      INDEX \`IDX_plans_motorised\` (\`motorised\`),
      INDEX \`IDX_plans_latest_published_at\` (\`latest_published_at\`),
      INDEX \`IDX_plans_rating\` (\`rating_average\`),
      INDEX \`IDX_plans_build_count\` (\`build_count\`),
      FULLTEXT INDEX \`FT_plans_search\` (\`title\`, \`summary\`, \`tags_text\`, \`search_notes\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_plans_owner\` FOREIGN KEY (\`owner_id\`) REFERENCES \`members\` (\`id\`) ON DELETE CASCADE
    ) ${TABLE_OPTIONS}`);
    await queryRunner.query(`CREATE TABLE \`plan_tools\` (
      \`plan_id\` int UNSIGNED NOT NULL,
      \`tool\` enum (${TOOLS}) NOT NULL,
      INDEX \`IDX_plan_tools_tool\` (\`tool\`, \`plan_id\`),
      PRIMARY KEY (\`plan_id\`, \`tool\`),
      CONSTRAINT \`FK_plan_tools_plan\` FOREIGN KEY (\`plan_id\`) REFERENCES \`plans\` (\`id\`) ON DELETE CASCADE
    ) ${TABLE_OPTIONS}`);
    await queryRunner.query(`CREATE TABLE \`revisions\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`plan_id\` int UNSIGNED NOT NULL,
      \`number\` int UNSIGNED NOT NULL,
      \`state\` enum ('draft', 'submitted', 'published', 'sent-back', 'declined', 'hidden') NOT NULL DEFAULT 'draft',
      \`changelog\` text NOT NULL,
      \`notes\` mediumtext NOT NULL,
      \`safety_notes\` text NOT NULL,
      \`hardware\` json NOT NULL,
      \`indexing\` json NULL,
      \`published_at\` datetime(3) NULL,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE INDEX \`UQ_revisions_plan_number\` (\`plan_id\`, \`number\`),
      INDEX \`IDX_revisions_state\` (\`state\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_revisions_plan\` FOREIGN KEY (\`plan_id\`) REFERENCES \`plans\` (\`id\`) ON DELETE CASCADE
    ) ${TABLE_OPTIONS}`);
    await queryRunner.query(`CREATE TABLE \`drawings\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`revision_id\` int UNSIGNED NOT NULL,
      \`storage_key\` varchar(300) NOT NULL,
      \`original_name\` varchar(255) NOT NULL,
      \`size\` int UNSIGNED NOT NULL,
      \`sha256\` char(64) NOT NULL,
      \`units\` varchar(20) NULL,
      \`status\` enum ('queued', 'analysing', 'done', 'failed') NOT NULL DEFAULT 'queued',
      \`error\` varchar(1000) NULL,
      \`analysis\` longtext NULL,
      \`entity_count\` int UNSIGNED NULL,
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE INDEX \`UQ_drawings_revision_sha256\` (\`revision_id\`, \`sha256\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_drawings_revision\` FOREIGN KEY (\`revision_id\`) REFERENCES \`revisions\` (\`id\`) ON DELETE CASCADE
    ) ${TABLE_OPTIONS}`);
    await queryRunner.query(`CREATE TABLE \`parts\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`revision_id\` int UNSIGNED NOT NULL,
      \`drawing_id\` int UNSIGNED NOT NULL,
      \`position\` int UNSIGNED NOT NULL,
      \`name\` varchar(120) NOT NULL,
      \`quantity\` int UNSIGNED NOT NULL,
      \`quantity_override\` int UNSIGNED NULL,
      \`length\` double NOT NULL,
      \`width\` double NOT NULL,
      \`thickness\` double NOT NULL,
      \`material\` varchar(120) NOT NULL,
      \`stock_kind\` enum ('sheet', 'solid', 'linear') NOT NULL,
      \`grain\` enum ('length', 'width', 'any') NOT NULL,
      \`outline\` json NOT NULL,
      INDEX \`IDX_parts_revision\` (\`revision_id\`),
      INDEX \`IDX_parts_drawing\` (\`drawing_id\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_parts_revision\` FOREIGN KEY (\`revision_id\`) REFERENCES \`revisions\` (\`id\`) ON DELETE CASCADE,
      CONSTRAINT \`FK_parts_drawing\` FOREIGN KEY (\`drawing_id\`) REFERENCES \`drawings\` (\`id\`) ON DELETE CASCADE
    ) ${TABLE_OPTIONS}`);
    await queryRunner.query(`CREATE TABLE \`attachments\` (
      \`id\` int UNSIGNED NOT NULL AUTO_INCREMENT,
      \`revision_id\` int UNSIGNED NOT NULL,
      \`storage_key\` varchar(300) NOT NULL,
      \`name\` varchar(255) NOT NULL,
      \`media_type\` varchar(100) NOT NULL,
      \`size\` int UNSIGNED NOT NULL,
      \`sha256\` char(64) NOT NULL,
      \`description\` varchar(500) NOT NULL DEFAULT '',
      \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE INDEX \`UQ_attachments_revision_sha256\` (\`revision_id\`, \`sha256\`),
      PRIMARY KEY (\`id\`),
      CONSTRAINT \`FK_attachments_revision\` FOREIGN KEY (\`revision_id\`) REFERENCES \`revisions\` (\`id\`) ON DELETE CASCADE
    ) ${TABLE_OPTIONS}`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE `attachments`');
    await queryRunner.query('DROP TABLE `parts`');
    await queryRunner.query('DROP TABLE `drawings`');
    await queryRunner.query('DROP TABLE `revisions`');
    await queryRunner.query('DROP TABLE `plan_tools`');
    await queryRunner.query('DROP TABLE `plans`');
  }
}
