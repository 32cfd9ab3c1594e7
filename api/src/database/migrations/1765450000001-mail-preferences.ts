import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Mail preferences: each follow is at once (default), in a daily or weekly digest, or paused; a
 * person's digest hour, weekday and IANA time zone, whether new fit reports reach them (members), and
 * a pause of all mail after repeated refusals by their mail server. Digest items wait for their digest.
 */
export class MailPreferences1765450000001 implements MigrationInterface {
  name = 'MailPreferences1765450000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      "ALTER TABLE follows ADD COLUMN delivery ENUM('at_once','daily','weekly','paused') NOT NULL DEFAULT 'at_once' AFTER target_id",
    );
    await queryRunner.query(`CREATE TABLE mail_preferences (
      user_id CHAR(36) NOT NULL,
      time_zone VARCHAR(64) NOT NULL DEFAULT 'UTC',
      digest_hour TINYINT NOT NULL DEFAULT 8,
      digest_weekday TINYINT NOT NULL DEFAULT 1,
      fit_report_mail ENUM('at_once','off') NOT NULL DEFAULT 'at_once',
      paused_at DATETIME(3) NULL,
      paused_note VARCHAR(500) NULL,
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (user_id),
      CONSTRAINT fk_mail_preferences_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`CREATE TABLE digest_items (
      id CHAR(36) NOT NULL,
      user_id CHAR(36) NOT NULL,
      follow_id CHAR(36) NULL,
      cadence ENUM('daily','weekly') NOT NULL,
      fit_check_event_id CHAR(36) NOT NULL,
      guide_title VARCHAR(200) NOT NULL,
      guide_url VARCHAR(500) NOT NULL,
      check_title VARCHAR(200) NOT NULL,
      state_before VARCHAR(20) NULL,
      state_after VARCHAR(20) NOT NULL,
      follow_label VARCHAR(200) NOT NULL,
      occurred_at DATETIME(3) NOT NULL,
      digest_key VARCHAR(191) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE KEY uq_digest_items_change (fit_check_event_id, user_id),
      KEY idx_digest_items_waiting (digest_key, user_id, occurred_at),
      CONSTRAINT fk_digest_items_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`CREATE TABLE mail_links (
      token_hash CHAR(64) NOT NULL,
      user_id CHAR(36) NOT NULL,
      purpose ENUM('digest') NOT NULL,
      cadence ENUM('daily','weekly') NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (token_hash),
      CONSTRAINT fk_mail_links_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE mail_links');
    await queryRunner.query('DROP TABLE digest_items');
    await queryRunner.query('DROP TABLE mail_preferences');
    await queryRunner.query('ALTER TABLE follows DROP COLUMN delivery');
  }
}
