import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Public part hits must match only what a published guide shows of a part (number, maker, title): a
 * match on its private notes would tell a stranger what the notes say. MATCH names exactly the columns
 * of one FULLTEXT index, so the public search gets an index of its own; members keep the one with notes.
 */
export class SearchPublicParts1765440000001 implements MigrationInterface {
  name = 'SearchPublicParts1765440000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE parts ADD FULLTEXT KEY ft_parts_public_text (part_number, maker, title)');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE parts DROP KEY ft_parts_public_text');
  }
}
