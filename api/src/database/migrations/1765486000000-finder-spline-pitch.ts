import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The fit finder narrows spline candidates by tooth count and pitch before the engine judges them, so a
 * question reads the features that can match (and a bounded window of near misses), not every spline with
 * that tooth count. The pitch key is the pitch system and its number to six decimals ("dp16.000000" for a
 * 16/32 diametral pitch, "m1.250000" for module 1.25); the service writes the reader's pitch the same way.
 * The key replaces the tooth-count key, whose column it leads with.
 */
export class FinderSplinePitch1765486000000 implements MigrationInterface {
  name = 'FinderSplinePitch1765486000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE part_features
      ADD COLUMN spline_pitch_key VARCHAR(24) CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci AS (IF(kind = 'spline', CASE
        WHEN JSON_VALUE(spec, '$.diametralPitch') IS NOT NULL THEN CONCAT('dp', CAST(JSON_VALUE(spec, '$.diametralPitch') AS DECIMAL(12,6)))
        WHEN JSON_VALUE(spec, '$.module') IS NOT NULL THEN CONCAT('m', CAST(JSON_VALUE(spec, '$.module') AS DECIMAL(12,6)))
      END, NULL)) VIRTUAL,
      ADD KEY idx_part_features_spline (spline_teeth, spline_pitch_key),
      DROP KEY idx_part_features_spline_teeth`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE part_features
      ADD KEY idx_part_features_spline_teeth (spline_teeth),
      DROP KEY idx_part_features_spline,
      DROP COLUMN spline_pitch_key`);
  }
}
