import { MigrationInterface, QueryRunner } from 'typeorm';

/** Fit reports: subscribers' "it fit / it did not fit" claims sent from published guides, with photos in storage. */
export class FitReports1765200000000 implements MigrationInterface {
  name = 'FitReports1765200000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE fit_reports (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      build_id CHAR(36) NOT NULL,
      guide_id CHAR(36) NULL,
      reporter_id CHAR(36) NOT NULL,
      outcome ENUM('fit','no_fit') NOT NULL,
      parts VARCHAR(2000) NOT NULL,
      vehicle VARCHAR(200) NOT NULL DEFAULT '',
      notes TEXT NOT NULL,
      photo_keys JSON NOT NULL,
      status ENUM('new','investigating','verified','declined') NOT NULL DEFAULT 'new',
      creator_note VARCHAR(1000) NOT NULL DEFAULT '',
      fit_check_id CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY idx_fit_reports_inbox (workshop_id, status, created_at),
      KEY idx_fit_reports_reporter (reporter_id, created_at),
      KEY idx_fit_reports_check (fit_check_id),
      CONSTRAINT fk_fit_reports_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_reports_build FOREIGN KEY (build_id) REFERENCES builds (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_reports_guide FOREIGN KEY (guide_id) REFERENCES guides (id) ON DELETE SET NULL,
      CONSTRAINT fk_fit_reports_reporter FOREIGN KEY (reporter_id) REFERENCES users (id) ON DELETE CASCADE,
      CONSTRAINT fk_fit_reports_check FOREIGN KEY (fit_check_id) REFERENCES fit_checks (id) ON DELETE SET NULL
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE fit_reports');
  }
}
