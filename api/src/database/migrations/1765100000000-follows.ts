import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Follows (a person follows a workshop, a build or an assembly) and the fit-news e-mails sent to
 * followers. A delivery is unique per person and fit-check change, so a retried or repeated event
 * never e-mails anyone twice; its token (SHA-256 kept) is the e-mail's one-click unsubscribe.
 */
export class Follows1765100000000 implements MigrationInterface {
  name = 'Follows1765100000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const table = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

    await queryRunner.query(`CREATE TABLE follows (
      id CHAR(36) NOT NULL PRIMARY KEY,
      user_id CHAR(36) NOT NULL,
      workshop_id CHAR(36) NOT NULL,
      target_kind ENUM('workshop','build','assembly') NOT NULL,
      target_id CHAR(36) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_follows_target (user_id, target_kind, target_id),
      KEY idx_follows_by_target (target_kind, target_id),
      CONSTRAINT fk_follows_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE,
      CONSTRAINT fk_follows_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE fit_news_deliveries (
      id CHAR(36) NOT NULL PRIMARY KEY,
      fit_check_event_id CHAR(36) NOT NULL,
      user_id CHAR(36) NOT NULL,
      follow_id CHAR(36) NULL,
      follow_label VARCHAR(200) NOT NULL,
      token_hash CHAR(64) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_fit_news_once (fit_check_event_id, user_id),
      UNIQUE KEY uq_fit_news_token (token_hash),
      CONSTRAINT fk_fit_news_event FOREIGN KEY (fit_check_event_id) REFERENCES fit_check_events (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_news_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_news_follow FOREIGN KEY (follow_id) REFERENCES follows (id) ON DELETE SET NULL
    ) ${table}`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE fit_news_deliveries');
    await queryRunner.query('DROP TABLE follows');
  }
}
