import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Marks (moments of a footage tied to what they show) and the suggestions mined from its transcript.
 * Marks reference the footage, not a cue, so they keep their times when the transcript is replaced.
 * A suggestion's key_hash is the SHA-256 of the miner's stable suggestion key; the unique key on
 * (footage_id, key_hash) lets a re-run insert only what is new, so a dismissed one never returns.
 */
export class Marks1764900000000 implements MigrationInterface {
  name = 'Marks1764900000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const table = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

    await queryRunner.query(`CREATE TABLE marks (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      footage_id CHAR(36) NOT NULL,
      start_ms INT UNSIGNED NOT NULL,
      end_ms INT UNSIGNED NULL,
      kind ENUM('part','measurement','check_evidence','step','caution','note') NOT NULL,
      part_id CHAR(36) NULL,
      measurement_id CHAR(36) NULL,
      fit_check_id CHAR(36) NULL,
      guide_step_id CHAR(36) NULL,
      label VARCHAR(200) NOT NULL DEFAULT '',
      created_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY idx_marks_footage (workshop_id, footage_id, start_ms),
      CONSTRAINT fk_marks_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_marks_footage FOREIGN KEY (footage_id) REFERENCES footage (id) ON DELETE CASCADE,
      CONSTRAINT fk_marks_part FOREIGN KEY (part_id) REFERENCES parts (id) ON DELETE SET NULL,
      CONSTRAINT fk_marks_measurement FOREIGN KEY (measurement_id) REFERENCES measurements (id) ON DELETE SET NULL,
      CONSTRAINT fk_marks_fit_check FOREIGN KEY (fit_check_id) REFERENCES fit_checks (id) ON DELETE SET NULL,
      CONSTRAINT fk_marks_creator FOREIGN KEY (created_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE mark_suggestions (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      footage_id CHAR(36) NOT NULL,
      transcript_id CHAR(36) NULL,
      cue_index INT UNSIGNED NOT NULL,
      start_ms INT UNSIGNED NOT NULL,
      end_ms INT UNSIGNED NOT NULL,
      kind ENUM('measurement','part') NOT NULL,
      phrase VARCHAR(300) NOT NULL,
      value VARCHAR(40) NULL,
      unit VARCHAR(8) NULL,
      millimetres DECIMAL(16,6) NULL,
      part_id CHAR(36) NULL,
      key_hash CHAR(64) NOT NULL,
      status ENUM('pending','accepted','dismissed') NOT NULL DEFAULT 'pending',
      mark_id CHAR(36) NULL,
      decided_by CHAR(36) NULL,
      decided_at DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_mark_suggestions_key (footage_id, key_hash),
      KEY idx_mark_suggestions_status (workshop_id, footage_id, status, start_ms),
      CONSTRAINT fk_mark_suggestions_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_mark_suggestions_footage FOREIGN KEY (footage_id) REFERENCES footage (id) ON DELETE CASCADE,
      CONSTRAINT fk_mark_suggestions_transcript FOREIGN KEY (transcript_id) REFERENCES transcripts (id) ON DELETE SET NULL,
      CONSTRAINT fk_mark_suggestions_part FOREIGN KEY (part_id) REFERENCES parts (id) ON DELETE SET NULL,
      CONSTRAINT fk_mark_suggestions_mark FOREIGN KEY (mark_id) REFERENCES marks (id) ON DELETE SET NULL,
      CONSTRAINT fk_mark_suggestions_decider FOREIGN KEY (decided_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE mark_suggestions');
    await queryRunner.query('DROP TABLE marks');
  }
}
