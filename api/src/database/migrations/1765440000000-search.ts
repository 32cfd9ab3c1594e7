import { MigrationInterface, QueryRunner } from 'typeorm';
import { guideSearchText, type GuideContent } from '../../guides/guide-content';

/**
 * Search. Every owning table gets its own InnoDB FULLTEXT index, so the index can never fall out of
 * step with the row it describes (InnoDB maintains it in the writing transaction). Published guides
 * are searched by their published revision, not the draft: `guide_revision_search` holds each
 * revision's words as plain text (written when the revision is published, backfilled here) with the
 * footage and assembly it names, so public cue and part hits join on indexed columns instead of
 * reading the JSON snapshot of every guide. Revisions never change, so that row never goes stale;
 * a withdrawn guide drops out because searches join on `guides.published_revision_id`.
 * Part numbers are tokenised by FULLTEXT at hyphens ("HL-21-CPL" → "cpl"): exact and prefix matches
 * go through `parts.part_number_key` (upper case, letters and digits only), now indexed on its own.
 */
export class Search1765440000000 implements MigrationInterface {
  name = 'Search1765440000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const table = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';
    await queryRunner.query(`CREATE TABLE guide_revision_search (
      revision_id CHAR(36) NOT NULL PRIMARY KEY,
      guide_id CHAR(36) NOT NULL,
      workshop_id CHAR(36) NOT NULL,
      footage_id CHAR(36) NULL,
      assembly_id CHAR(36) NULL,
      title VARCHAR(200) NOT NULL,
      search_text MEDIUMTEXT NOT NULL,
      KEY idx_guide_revision_search_footage (footage_id),
      KEY idx_guide_revision_search_assembly (assembly_id),
      FULLTEXT KEY ft_guide_revision_search_text (search_text),
      CONSTRAINT fk_guide_revision_search_revision FOREIGN KEY (revision_id) REFERENCES guide_revisions (id) ON DELETE CASCADE
    ) ${table}`);

    const revisions: { id: string; guideId: string; workshopId: string; content: string | GuideContent }[] = await queryRunner.query(
      `SELECT r.id, r.guide_id AS guideId, g.workshop_id AS workshopId, r.content
       FROM guide_revisions r JOIN guides g ON g.id = r.guide_id`,
    );
    for (const revision of revisions) {
      const content: GuideContent = typeof revision.content === 'string' ? (JSON.parse(revision.content) as GuideContent) : revision.content;
      await queryRunner.query(
        'INSERT INTO guide_revision_search (revision_id, guide_id, workshop_id, footage_id, assembly_id, title, search_text) VALUES (?, ?, ?, ?, ?, ?, ?)',
        [revision.id, revision.guideId, revision.workshopId, content.footageId, content.assemblyId, content.title, guideSearchText(content)],
      );
    }

    await queryRunner.query('ALTER TABLE builds ADD FULLTEXT KEY ft_builds_text (title, vehicle, goal)');
    await queryRunner.query('ALTER TABLE parts ADD FULLTEXT KEY ft_parts_text (part_number, maker, title, notes)');
    await queryRunner.query('ALTER TABLE parts ADD KEY idx_parts_number_key (part_number_key)');
    await queryRunner.query('ALTER TABLE footage ADD FULLTEXT KEY ft_footage_title (title)');
    await queryRunner.query('ALTER TABLE marks ADD FULLTEXT KEY ft_marks_label (label)');
    await queryRunner.query('ALTER TABLE fit_checks ADD FULLTEXT KEY ft_fit_checks_text (title, reason)');
    await queryRunner.query('ALTER TABLE guides ADD FULLTEXT KEY ft_guides_text (title, summary)');
    await queryRunner.query('ALTER TABLE guide_steps ADD FULLTEXT KEY ft_guide_steps_text (title, body, caution_text)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE guide_steps DROP KEY ft_guide_steps_text');
    await queryRunner.query('ALTER TABLE guides DROP KEY ft_guides_text');
    await queryRunner.query('ALTER TABLE fit_checks DROP KEY ft_fit_checks_text');
    await queryRunner.query('ALTER TABLE marks DROP KEY ft_marks_label');
    await queryRunner.query('ALTER TABLE footage DROP KEY ft_footage_title');
    await queryRunner.query('ALTER TABLE parts DROP KEY idx_parts_number_key');
    await queryRunner.query('ALTER TABLE parts DROP KEY ft_parts_text');
    await queryRunner.query('ALTER TABLE builds DROP KEY ft_builds_text');
    await queryRunner.query('DROP TABLE guide_revision_search');
  }
}
