import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

export const FIT_REPORT_MAIL = ['at_once', 'off'] as const;
export type FitReportMail = (typeof FIT_REPORT_MAIL)[number];

/** A person's mail settings; a person without a row has the defaults (UTC, 08:00, Monday, fit reports at once). */
@Entity('mail_preferences')
export class MailPreference {
  @PrimaryColumn({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  @Column({ name: 'time_zone', type: 'varchar', length: 64, default: 'UTC' })
  timeZone!: string;

  @Column({ name: 'digest_hour', type: 'tinyint', default: 8 })
  digestHour!: number;

  /** 0 = Sunday … 6 = Saturday. */
  @Column({ name: 'digest_weekday', type: 'tinyint', default: 1 })
  digestWeekday!: number;

  /** For workshop owners and editors: the mail that a new fit report arrived. */
  @Column({ name: 'fit_report_mail', type: 'enum', enum: FIT_REPORT_MAIL, default: 'at_once' })
  fitReportMail!: FitReportMail;

  /** Set when the person's mail server refused our mail again and again: no mail until they resume it. */
  @Column({ name: 'paused_at', type: 'datetime', precision: 3, nullable: true })
  pausedAt!: Date | null;

  @Column({ name: 'paused_note', type: 'varchar', length: 500, nullable: true })
  pausedNote!: string | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt!: Date;
}

export const DEFAULT_MAIL_PREFERENCE = { timeZone: 'UTC', digestHour: 8, digestWeekday: 1, fitReportMail: 'at_once' as FitReportMail, pausedAt: null, pausedNote: null };
