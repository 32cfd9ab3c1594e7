import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Footage (a build's videos), their resumable multipart uploads, transcripts with every revision
 * kept, and transcript cues with a FULLTEXT index for search. Adds the foreign key that
 * `measurements.footage_id` waited for.
 */
export class Footage1764840000000 implements MigrationInterface {
  name = 'Footage1764840000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const timestamps = `
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)`;
    const table = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

    await queryRunner.query(`CREATE TABLE footage (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      build_id CHAR(36) NOT NULL,
      title VARCHAR(200) NOT NULL,
      original_name VARCHAR(255) NOT NULL,
      content_type VARCHAR(100) NOT NULL,
      size_bytes BIGINT UNSIGNED NOT NULL,
      object_key VARCHAR(300) NOT NULL,
      state ENUM('uploading','processing','ready','failed') NOT NULL DEFAULT 'uploading',
      failure_reason VARCHAR(500) NULL,
      duration_ms INT UNSIGNED NULL,
      width INT UNSIGNED NULL,
      height INT UNSIGNED NULL,
      frame_rate DECIMAL(9,3) NULL,
      container VARCHAR(40) NULL,
      video_codec VARCHAR(40) NULL,
      audio_codec VARCHAR(40) NULL,
      poster_key VARCHAR(300) NULL,
      created_by CHAR(36) NULL,
      processed_at DATETIME(3) NULL,
      ${timestamps},
      UNIQUE KEY uq_footage_object (object_key),
      KEY idx_footage_build (workshop_id, build_id, created_at),
      KEY idx_footage_state (state, updated_at),
      CONSTRAINT fk_footage_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_footage_build FOREIGN KEY (build_id) REFERENCES builds (id) ON DELETE CASCADE,
      CONSTRAINT fk_footage_creator FOREIGN KEY (created_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    // The S3 fake has no ListParts, and a resumed browser upload must know which parts are done:
    // every finished part's number and ETag is kept here until the upload completes or is aborted.
    await queryRunner.query(`CREATE TABLE footage_uploads (
      footage_id CHAR(36) NOT NULL PRIMARY KEY,
      upload_id VARCHAR(1024) NOT NULL,
      part_size_bytes INT UNSIGNED NOT NULL,
      part_count SMALLINT UNSIGNED NOT NULL,
      ${timestamps},
      CONSTRAINT fk_footage_uploads_footage FOREIGN KEY (footage_id) REFERENCES footage (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE footage_upload_parts (
      footage_id CHAR(36) NOT NULL,
      part_number SMALLINT UNSIGNED NOT NULL,
      etag VARCHAR(200) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (footage_id, part_number),
      CONSTRAINT fk_upload_parts_upload FOREIGN KEY (footage_id) REFERENCES footage_uploads (footage_id) ON DELETE CASCADE
    ) ${table}`);

    // One row per revision; replacing a transcript adds a revision and moves the active flag.
    // is_active is 1 or NULL (never 0): the unique key on (footage_id, is_active) then allows one active revision each.
    await queryRunner.query(`CREATE TABLE transcripts (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      footage_id CHAR(36) NOT NULL,
      revision INT UNSIGNED NOT NULL,
      format ENUM('webvtt','srt','timestamped') NOT NULL,
      source_name VARCHAR(255) NULL,
      source_text MEDIUMTEXT NOT NULL,
      cue_count INT UNSIGNED NOT NULL,
      is_active TINYINT(1) NULL DEFAULT 1,
      created_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_transcripts_revision (footage_id, revision),
      UNIQUE KEY uq_transcripts_active (footage_id, is_active),
      KEY idx_transcripts_workshop (workshop_id, is_active),
      CONSTRAINT chk_transcripts_active CHECK (is_active = 1),
      CONSTRAINT fk_transcripts_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_transcripts_footage FOREIGN KEY (footage_id) REFERENCES footage (id) ON DELETE CASCADE,
      CONSTRAINT fk_transcripts_creator FOREIGN KEY (created_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE transcript_cues (
      transcript_id CHAR(36) NOT NULL,
      cue_index INT UNSIGNED NOT NULL,
      start_ms INT UNSIGNED NOT NULL,
      end_ms INT UNSIGNED NOT NULL,
      identifier VARCHAR(255) NULL,
      text TEXT NOT NULL,
      PRIMARY KEY (transcript_id, cue_index),
      KEY idx_cues_time (transcript_id, start_ms),
      FULLTEXT KEY ft_cues_text (text),
      CONSTRAINT fk_cues_transcript FOREIGN KEY (transcript_id) REFERENCES transcripts (id) ON DELETE CASCADE
    ) ${table}`);

    await queryRunner.query(`ALTER TABLE measurements
      ADD CONSTRAINT fk_measurements_footage FOREIGN KEY (footage_id) REFERENCES footage (id) ON DELETE SET NULL`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE measurements DROP FOREIGN KEY fk_measurements_footage');
    await queryRunner.query('ALTER TABLE measurements DROP INDEX fk_measurements_footage');
    for (const name of ['transcript_cues', 'transcripts', 'footage_upload_parts', 'footage_uploads', 'footage']) {
      await queryRunner.query(`DROP TABLE ${name}`);
    }
  }
}
