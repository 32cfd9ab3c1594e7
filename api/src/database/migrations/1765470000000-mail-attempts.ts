import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The relay writes down that it is about to hand a message to the SMTP server (`attempt_started_at`)
 * and clears it when the answer is recorded. A delivery claimed again with that mark still set was
 * possibly accepted already (its relay died between the server's 250 and the record): the claim counts
 * it in `uncertain_attempts`, so the record and the fault tests can name exactly which mails may have
 * gone twice. `sent_by` is the relay process that recorded the send.
 */
export class MailAttempts1765470000000 implements MigrationInterface {
  name = 'MailAttempts1765470000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE mail_deliveries
         ADD attempt_started_at DATETIME(3) NULL AFTER lease_until,
         ADD uncertain_attempts INT NOT NULL DEFAULT 0 AFTER attempt_started_at,
         ADD sent_by CHAR(36) NULL AFTER sent_at`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('ALTER TABLE mail_deliveries DROP COLUMN attempt_started_at, DROP COLUMN uncertain_attempts, DROP COLUMN sent_by');
  }
}
