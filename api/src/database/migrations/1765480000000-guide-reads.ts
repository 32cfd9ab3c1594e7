import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Which published revision of a guide a signed-in reader last opened, so the guide can tell them it was
 * updated since. One row per reader and guide; it goes with the account or the guide.
 */
export class GuideReads1765480000000 implements MigrationInterface {
  name = 'GuideReads1765480000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE guide_reads (
      user_id CHAR(36) NOT NULL,
      guide_id CHAR(36) NOT NULL,
      revision_number INT UNSIGNED NOT NULL,
      read_at DATETIME(3) NOT NULL,
      PRIMARY KEY (user_id, guide_id),
      KEY idx_guide_reads_guide (guide_id),
      CONSTRAINT fk_guide_reads_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE,
      CONSTRAINT fk_guide_reads_guide FOREIGN KEY (guide_id) REFERENCES guides (id) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE guide_reads');
  }
}
