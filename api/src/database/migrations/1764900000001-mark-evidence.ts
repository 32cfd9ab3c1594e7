import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * fit_check_evidence.mark_id was waiting for the marks table: evidence now goes with the mark it
 * points at. A migration of its own because the marks migration may already be applied.
 */
export class MarkEvidence1764900000001 implements MigrationInterface {
  name = 'MarkEvidence1764900000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    // Evidence whose mark is already gone proves nothing (and would block the key).
    await queryRunner.query(
      'DELETE FROM fit_check_evidence WHERE mark_id IS NOT NULL AND NOT EXISTS (SELECT 1 FROM marks WHERE marks.id = fit_check_evidence.mark_id)',
    );
    await queryRunner.query(
      'ALTER TABLE fit_check_evidence ADD CONSTRAINT fk_evidence_mark FOREIGN KEY (mark_id) REFERENCES marks (id) ON DELETE CASCADE',
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE fit_check_evidence DROP FOREIGN KEY fk_evidence_mark');
    await queryRunner.query('ALTER TABLE fit_check_evidence DROP INDEX fk_evidence_mark');
  }
}
