import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The public index and its entity tag select the published guides (`published_revision_id IS NOT NULL`);
 * without a key on that column each request read every guide row, drafts and their summaries included.
 * The key also holds the workshop and build ids the tag joins on, so the tag reads the key alone.
 */
export class PublishedGuidesIndex1765320000000 implements MigrationInterface {
  name = 'PublishedGuidesIndex1765320000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE guides ADD KEY idx_guides_published (published_revision_id, workshop_id, build_id)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE guides DROP KEY idx_guides_published');
  }
}
