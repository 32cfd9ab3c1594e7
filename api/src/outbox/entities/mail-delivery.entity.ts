import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

export const MAIL_DELIVERY_STATES = ['pending', 'sent', 'failed'] as const;
export type MailDeliveryState = (typeof MAIL_DELIVERY_STATES)[number];

/** One e-mail to one recipient. The idempotency key (e.g. change and person) is unique, so no path writes it twice. */
@Entity('mail_deliveries')
@Index(['idempotencyKey'], { unique: true })
@Index(['state', 'nextAttemptAt'])
@Index(['fitCheckEventId', 'state'])
@Index(['sentAt'])
export class MailDelivery {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'idempotency_key', type: 'varchar', length: 191 })
  idempotencyKey!: string;

  /** account, invitation, fit-news, fit-report, digest: what kind of mail, for the record and the tests. */
  @Column({ type: 'varchar', length: 40 })
  kind!: string;

  @Column({ type: 'varchar', length: 320 })
  recipient!: string;

  @Column({ name: 'user_id', type: 'char', length: 36, nullable: true })
  userId!: string | null;

  /** For fit news: the fit-check change it tells (the creator's delivery record counts by it). */
  @Column({ name: 'fit_check_event_id', type: 'char', length: 36, nullable: true })
  fitCheckEventId!: string | null;

  @Column({ type: 'varchar', length: 500 })
  subject!: string;

  /** Emptied once sent: bodies carry one-time links (sign-in, unsubscribe) that the record needs not keep. */
  @Column({ name: 'body_text', type: 'mediumtext' })
  bodyText!: string;

  @Column({ name: 'body_html', type: 'mediumtext', nullable: true })
  bodyHtml!: string | null;

  /** JSON object of extra headers (List-Unsubscribe…). */
  @Column({ type: 'text', nullable: true })
  headers!: string | null;

  @Column({ type: 'enum', enum: MAIL_DELIVERY_STATES, default: 'pending' })
  state!: MailDeliveryState;

  @Column({ type: 'int', default: 0 })
  attempts!: number;

  @Column({ name: 'next_attempt_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  nextAttemptAt!: Date;

  /** The relay process sending it now, until `leaseUntil`; a dead process's lease lapses and another sends. */
  @Column({ name: 'lease_owner', type: 'char', length: 36, nullable: true })
  leaseOwner!: string | null;

  @Column({ name: 'lease_until', type: 'datetime', precision: 3, nullable: true })
  leaseUntil!: Date | null;

  /**
   * Set just before the message is handed to the SMTP server, cleared when the answer is recorded. Still
   * set when the delivery is claimed again: its relay died mid-send, so the server may already hold it.
   */
  @Column({ name: 'attempt_started_at', type: 'datetime', precision: 3, nullable: true })
  attemptStartedAt!: Date | null;

  /** How many times it was claimed again after an unfinished attempt: each a send that may have gone twice (same Message-ID). */
  @Column({ name: 'uncertain_attempts', type: 'int', default: 0 })
  uncertainAttempts!: number;

  /** The SMTP server's last answer: its acceptance, or why it refused. */
  @Column({ name: 'smtp_reply', type: 'varchar', length: 500, nullable: true })
  smtpReply!: string | null;

  @Column({ name: 'sent_at', type: 'datetime', precision: 3, nullable: true })
  sentAt!: Date | null;

  /** The relay process that recorded the send (two workers share a fan-out; the tests count by it). */
  @Column({ name: 'sent_by', type: 'char', length: 36, nullable: true })
  sentBy!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
