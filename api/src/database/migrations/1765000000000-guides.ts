import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Build guides: the draft (guides, guide_steps) and its published revisions (a JSON snapshot each).
 * A guide's slug is unique within its workshop, so a public address is /guides/<workshop>/<guide>.
 * Marks gain the foreign key to guide steps that waited for this table.
 */
export class Guides1765000000000 implements MigrationInterface {
  name = 'Guides1765000000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const table = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

    await queryRunner.query(`CREATE TABLE guides (
      id CHAR(36) NOT NULL PRIMARY KEY,
      workshop_id CHAR(36) NOT NULL,
      build_id CHAR(36) NOT NULL,
      title VARCHAR(200) NOT NULL,
      slug VARCHAR(120) NOT NULL,
      summary MEDIUMTEXT NOT NULL,
      footage_id CHAR(36) NULL,
      assembly_id CHAR(36) NULL,
      safety_topics JSON NOT NULL,
      tools JSON NOT NULL,
      consumables JSON NOT NULL,
      published_revision_id CHAR(36) NULL,
      created_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_guides_slug (workshop_id, slug),
      KEY idx_guides_build (build_id),
      CONSTRAINT fk_guides_workshop FOREIGN KEY (workshop_id) REFERENCES workshops (id) ON DELETE CASCADE,
      CONSTRAINT fk_guides_build FOREIGN KEY (build_id) REFERENCES builds (id) ON DELETE CASCADE,
      CONSTRAINT fk_guides_footage FOREIGN KEY (footage_id) REFERENCES footage (id) ON DELETE SET NULL,
      CONSTRAINT fk_guides_assembly FOREIGN KEY (assembly_id) REFERENCES assemblies (id) ON DELETE SET NULL,
      CONSTRAINT fk_guides_creator FOREIGN KEY (created_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE guide_steps (
      id CHAR(36) NOT NULL PRIMARY KEY,
      guide_id CHAR(36) NOT NULL,
      position INT UNSIGNED NOT NULL,
      title VARCHAR(200) NOT NULL,
      body MEDIUMTEXT NOT NULL,
      footage_id CHAR(36) NULL,
      start_ms INT UNSIGNED NULL,
      end_ms INT UNSIGNED NULL,
      caution_level ENUM('DANGER','WARNING','CAUTION','NOTICE') NULL,
      caution_text VARCHAR(1000) NOT NULL DEFAULT '',
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY idx_guide_steps_order (guide_id, position),
      CONSTRAINT fk_guide_steps_guide FOREIGN KEY (guide_id) REFERENCES guides (id) ON DELETE CASCADE,
      CONSTRAINT fk_guide_steps_footage FOREIGN KEY (footage_id) REFERENCES footage (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(`CREATE TABLE guide_revisions (
      id CHAR(36) NOT NULL PRIMARY KEY,
      guide_id CHAR(36) NOT NULL,
      number INT UNSIGNED NOT NULL,
      note VARCHAR(500) NOT NULL DEFAULT '',
      content JSON NOT NULL,
      content_hash CHAR(64) NOT NULL,
      published_by CHAR(36) NULL,
      published_at DATETIME(3) NOT NULL,
      UNIQUE KEY uq_guide_revisions_number (guide_id, number),
      CONSTRAINT fk_guide_revisions_guide FOREIGN KEY (guide_id) REFERENCES guides (id) ON DELETE CASCADE,
      CONSTRAINT fk_guide_revisions_publisher FOREIGN KEY (published_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${table}`);

    await queryRunner.query(
      'ALTER TABLE guides ADD CONSTRAINT fk_guides_published_revision FOREIGN KEY (published_revision_id) REFERENCES guide_revisions (id) ON DELETE SET NULL',
    );
    await queryRunner.query(
      'ALTER TABLE marks ADD CONSTRAINT fk_marks_guide_step FOREIGN KEY (guide_step_id) REFERENCES guide_steps (id) ON DELETE SET NULL',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE marks DROP FOREIGN KEY fk_marks_guide_step');
    await queryRunner.query('ALTER TABLE guides DROP FOREIGN KEY fk_guides_published_revision');
    await queryRunner.query('DROP TABLE guide_revisions');
    await queryRunner.query('DROP TABLE guide_steps');
    await queryRunner.query('DROP TABLE guides');
  }
}
