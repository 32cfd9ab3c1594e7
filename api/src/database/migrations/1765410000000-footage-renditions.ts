import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Web renditions of footage (HLS, a download MP4, scrub-preview sprites, a waveform): their state
 * and progress on the footage row, the size as displayed, whether the original is still stored, and
 * the workshop's keep/drop-originals choice. Footage already ready stays `waiting`: the media
 * service queues its renditions at the next start.
 */
export class FootageRenditions1765410000000 implements MigrationInterface {
  name = 'FootageRenditions1765410000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE footage
      ADD COLUMN display_width INT UNSIGNED NULL,
      ADD COLUMN display_height INT UNSIGNED NULL,
      ADD COLUMN renditions_state ENUM('waiting','processing','ready','failed') NOT NULL DEFAULT 'waiting',
      ADD COLUMN renditions_percent DECIMAL(4,1) NULL,
      ADD COLUMN renditions_seconds_left INT UNSIGNED NULL,
      ADD COLUMN renditions_reason VARCHAR(500) NULL,
      ADD COLUMN renditions_progress_at DATETIME(3) NULL,
      ADD COLUMN renditions_media LONGTEXT NULL,
      ADD COLUMN original_kept TINYINT(1) NOT NULL DEFAULT 1`);
    await queryRunner.query(`CREATE TABLE workshop_media_settings (
      workshop_id CHAR(36) NOT NULL,
      keep_originals TINYINT(1) NOT NULL DEFAULT 1,
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (workshop_id),
      CONSTRAINT fk_media_settings_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE workshop_media_settings');
    await queryRunner.query(`ALTER TABLE footage
      DROP COLUMN display_width, DROP COLUMN display_height, DROP COLUMN renditions_state, DROP COLUMN renditions_percent,
      DROP COLUMN renditions_seconds_left, DROP COLUMN renditions_reason, DROP COLUMN renditions_progress_at,
      DROP COLUMN renditions_media, DROP COLUMN original_kept`);
  }
}
