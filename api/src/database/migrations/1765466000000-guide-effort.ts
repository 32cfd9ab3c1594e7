import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * How much a guide asks of its reader: a skill level and an estimated time in minutes on the guide,
 * and an optional estimate per step. All nullable: existing guides simply have none yet.
 */
export class GuideEffort1765466000000 implements MigrationInterface {
  name = 'GuideEffort1765466000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      "ALTER TABLE guides ADD COLUMN skill_level ENUM('bench_starter','shop_regular','seasoned_fitter') NULL AFTER consumables, " +
        'ADD COLUMN estimated_minutes SMALLINT UNSIGNED NULL AFTER skill_level',
    );
    await queryRunner.query('ALTER TABLE guide_steps ADD COLUMN estimated_minutes SMALLINT UNSIGNED NULL AFTER caution_text');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE guide_steps DROP COLUMN estimated_minutes');
    await queryRunner.query('ALTER TABLE guides DROP COLUMN estimated_minutes, DROP COLUMN skill_level');
  }
}
