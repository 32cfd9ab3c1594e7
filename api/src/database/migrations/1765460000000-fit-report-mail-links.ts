import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The "new fit report" mail to owners and editors carries an unsubscribe and a preferences link like
 * every other mail: its token is a mail link of its own purpose (stopping it turns that mail off).
 */
export class FitReportMailLinks1765460000000 implements MigrationInterface {
  name = 'FitReportMailLinks1765460000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE mail_links MODIFY purpose ENUM('digest','fit_report') NOT NULL`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM mail_links WHERE purpose = 'fit_report'`);
    await queryRunner.query(`ALTER TABLE mail_links MODIFY purpose ENUM('digest') NOT NULL`);
  }
}
