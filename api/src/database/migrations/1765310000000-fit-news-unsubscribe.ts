import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * An unsubscribe link that does what it says: each fit-news delivery records the assembly it was
 * about (so the unsubscribe page can list the person's other follows that still bring news of it)
 * and, for mail to a fit reporter, the report behind it; a report's fit news can be stopped.
 */
export class FitNewsUnsubscribe1765310000000 implements MigrationInterface {
  name = 'FitNewsUnsubscribe1765310000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE fit_news_deliveries
      ADD COLUMN assembly_id CHAR(36) NULL AFTER user_id,
      ADD COLUMN fit_report_id CHAR(36) NULL AFTER follow_id`);
    // Deliveries already sent were about the assembly of the check whose change they told.
    await queryRunner.query(`UPDATE fit_news_deliveries delivery
      JOIN fit_check_events history ON history.id = delivery.fit_check_event_id
      JOIN fit_checks fit_check ON fit_check.id = history.fit_check_id
      SET delivery.assembly_id = fit_check.assembly_id`);
    await queryRunner.query(`ALTER TABLE fit_news_deliveries
      MODIFY assembly_id CHAR(36) NOT NULL,
      ADD CONSTRAINT fk_fit_news_report FOREIGN KEY (fit_report_id) REFERENCES fit_reports (id) ON DELETE SET NULL`);
    await queryRunner.query('ALTER TABLE fit_reports ADD COLUMN fit_news_stopped_at DATETIME(3) NULL AFTER fit_check_id');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE fit_reports DROP COLUMN fit_news_stopped_at');
    await queryRunner.query('ALTER TABLE fit_news_deliveries DROP FOREIGN KEY fk_fit_news_report');
    await queryRunner.query('ALTER TABLE fit_news_deliveries DROP COLUMN fit_report_id, DROP COLUMN assembly_id');
  }
}
