import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn } from '../../common/database/columns';

/** The token of a digest's or a fit-report mail's links (unsubscribe, preferences), kept as its SHA-256. */
@Entity('mail_links')
export class MailLink {
  @PrimaryColumn({ name: 'token_hash', type: 'char', length: 64 })
  tokenHash!: string;

  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  @Column({ type: 'enum', enum: ['digest', 'fit_report'] })
  purpose!: 'digest' | 'fit_report';

  @Column({ type: 'enum', enum: ['daily', 'weekly'], nullable: true })
  cadence!: 'daily' | 'weekly' | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
