import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What the fit finder needs to answer from keys, not scans:
 * - part_features: the spline tooth count and the diameter/length size, read from the typed spec
 *   into virtual columns with keys, so a finder query starts from the features that can match;
 * - parts: a key on the maker, which the finder looks up across workshops (the part number key comes
 *   with the search migration, 1765440000000);
 * - guide_revisions: the assembly a published revision shows (fixed in its content), keyed, so a
 *   matching assembly leads straight to the guides that publish it;
 * - workshops: whether members' names may appear on public pages ("confirmed by Rowan Avery");
 *   off unless the workshop turns it on.
 */
export class FitFinder1765430000000 implements MigrationInterface {
  name = 'FitFinder1765430000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE part_features
      ADD COLUMN spline_teeth SMALLINT UNSIGNED AS (IF(kind = 'spline', JSON_VALUE(spec, '$.teeth'), NULL)) VIRTUAL,
      ADD COLUMN size_nm BIGINT AS (CASE kind WHEN 'diameter' THEN JSON_VALUE(spec, '$.nominalNm') WHEN 'length' THEN JSON_VALUE(spec, '$.lengthNm') END) VIRTUAL,
      ADD KEY idx_part_features_spline_teeth (spline_teeth),
      ADD KEY idx_part_features_size (kind, size_nm)`);
    await queryRunner.query('ALTER TABLE parts ADD KEY idx_parts_maker (maker)');
    await queryRunner.query(`ALTER TABLE guide_revisions
      ADD COLUMN content_assembly_id CHAR(36) CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci AS (JSON_VALUE(content, '$.assemblyId')) VIRTUAL,
      ADD KEY idx_guide_revisions_assembly (content_assembly_id)`);
    await queryRunner.query('ALTER TABLE workshops ADD COLUMN show_member_names TINYINT(1) NOT NULL DEFAULT 0');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE workshops DROP COLUMN show_member_names');
    await queryRunner.query('ALTER TABLE guide_revisions DROP KEY idx_guide_revisions_assembly, DROP COLUMN content_assembly_id');
    await queryRunner.query('ALTER TABLE parts DROP KEY idx_parts_maker');
    await queryRunner.query(
      'ALTER TABLE part_features DROP KEY idx_part_features_size, DROP KEY idx_part_features_spline_teeth, DROP COLUMN size_nm, DROP COLUMN spline_teeth',
    );
  }
}
