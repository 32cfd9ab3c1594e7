import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

/** One fit-news e-mail to one person for one fit-check change; its token stops the follow (or fit report) behind it. */
@Entity('fit_news_deliveries')
@Index(['fitCheckEventId', 'userId'], { unique: true })
@Index(['tokenHash'], { unique: true })
export class FitNewsDelivery {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'fit_check_event_id', type: 'char', length: 36 })
  fitCheckEventId!: string;

  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  /** The assembly whose check changed: the unsubscribe page lists the other follows that still bring news of it. */
  @Column({ name: 'assembly_id', type: 'char', length: 36 })
  assemblyId!: string;

  /** Null once that follow is gone. */
  @Column({ name: 'follow_id', type: 'char', length: 36, nullable: true })
  followId!: string | null;

  /** For mail sent because the person's fit report is verified by the check: its token stops that report's news. */
  @Column({ name: 'fit_report_id', type: 'char', length: 36, nullable: true })
  fitReportId!: string | null;

  /** What was followed, as named when the e-mail went out. */
  @Column({ name: 'follow_label', type: 'varchar', length: 200 })
  followLabel!: string;

  @Column({ name: 'token_hash', type: 'char', length: 64 })
  tokenHash!: string;

  @CreatedAtColumn()
  createdAt!: Date;
}
