import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * One way to send mail: a transactional outbox. `outbox_events` rows commit with the change that
 * causes them (a fit-check change); the relay turns each into `mail_deliveries`, one per recipient
 * and change (a unique idempotency key), and marks a delivery sent only after the SMTP server
 * accepted it. Plain mail (sign-up, invitations, resets) is written straight to `mail_deliveries`.
 */
export class MailOutbox1765450000000 implements MigrationInterface {
  name = 'MailOutbox1765450000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`CREATE TABLE outbox_events (
      id CHAR(36) NOT NULL,
      kind VARCHAR(60) NOT NULL,
      payload LONGTEXT NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      relayed_at DATETIME(3) NULL,
      PRIMARY KEY (id),
      KEY idx_outbox_events_pending (relayed_at, created_at)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await queryRunner.query(`CREATE TABLE mail_deliveries (
      id CHAR(36) NOT NULL,
      idempotency_key VARCHAR(191) NOT NULL,
      kind VARCHAR(40) NOT NULL,
      recipient VARCHAR(320) NOT NULL,
      user_id CHAR(36) NULL,
      fit_check_event_id CHAR(36) NULL,
      subject VARCHAR(500) NOT NULL,
      body_text MEDIUMTEXT NOT NULL,
      body_html MEDIUMTEXT NULL,
      headers TEXT NULL,
      state ENUM('pending','sent','failed') NOT NULL DEFAULT 'pending',
      attempts INT NOT NULL DEFAULT 0,
      next_attempt_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      lease_owner CHAR(36) NULL,
      lease_until DATETIME(3) NULL,
      smtp_reply VARCHAR(500) NULL,
      sent_at DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE KEY uq_mail_deliveries_key (idempotency_key),
      KEY idx_mail_deliveries_due (state, next_attempt_at),
      KEY idx_mail_deliveries_change (fit_check_event_id, state),
      KEY idx_mail_deliveries_sent (sent_at),
      KEY idx_mail_deliveries_recipient (recipient(191), state)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE mail_deliveries');
    await queryRunner.query('DROP TABLE outbox_events');
  }
}
