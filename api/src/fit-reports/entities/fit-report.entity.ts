import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';

export const FIT_REPORT_OUTCOMES = ['fit', 'no_fit'] as const;
export type FitReportOutcome = (typeof FIT_REPORT_OUTCOMES)[number];

export const FIT_REPORT_STATUSES = ['new', 'investigating', 'verified', 'declined'] as const;
export type FitReportStatus = (typeof FIT_REPORT_STATUSES)[number];

/** A subscriber's claim, sent from a published guide: "I combined these parts and it fit / did not fit". */
@Entity('fit_reports')
@Index(['workshopId', 'status', 'createdAt'])
@Index(['reporterId', 'createdAt'])
@Index(['fitCheckId'])
export class FitReport {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ name: 'build_id', type: 'char', length: 36 })
  buildId!: string;

  /** The guide it was sent from (null once that guide is deleted). */
  @Column({ name: 'guide_id', type: 'char', length: 36, nullable: true })
  guideId!: string | null;

  @Column({ name: 'reporter_id', type: 'char', length: 36 })
  reporterId!: string;

  @Column({ type: 'enum', enum: FIT_REPORT_OUTCOMES })
  outcome!: FitReportOutcome;

  /** What was combined, in the reporter's words (part numbers, makers). */
  @Column({ type: 'varchar', length: 2000 })
  parts!: string;

  @Column({ type: 'varchar', length: 200, default: '' })
  vehicle!: string;

  @Column({ type: 'text' })
  notes!: string;

  @Column({ name: 'photo_keys', type: 'json' })
  photoKeys!: string[];

  @Column({ type: 'enum', enum: FIT_REPORT_STATUSES, default: 'new' })
  status!: FitReportStatus;

  /** The creator's word to the reporter. */
  @Column({ name: 'creator_note', type: 'varchar', length: 1000, default: '' })
  creatorNote!: string;

  /** The creator's fit check that verifies the claim; its confirmation or no-fit e-mails the reporter. */
  @Column({ name: 'fit_check_id', type: 'char', length: 36, nullable: true })
  fitCheckId!: string | null;

  /** Set when the reporter stopped this report's fit news from an e-mail's unsubscribe link. */
  @Column({ name: 'fit_news_stopped_at', type: 'datetime', precision: 3, nullable: true })
  fitNewsStoppedAt!: Date | null;

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
