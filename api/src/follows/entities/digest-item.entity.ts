import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

/** One change waiting for a person's daily or weekly digest; `digestKey` is set when a digest took it. */
@Entity('digest_items')
@Index(['fitCheckEventId', 'userId'], { unique: true })
export class DigestItem {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  @Column({ name: 'follow_id', type: 'char', length: 36, nullable: true })
  followId!: string | null;

  @Column({ type: 'enum', enum: ['daily', 'weekly'] })
  cadence!: 'daily' | 'weekly';

  @Column({ name: 'fit_check_event_id', type: 'char', length: 36 })
  fitCheckEventId!: string;

  @Column({ name: 'guide_title', type: 'varchar', length: 200 })
  guideTitle!: string;

  @Column({ name: 'guide_url', type: 'varchar', length: 500 })
  guideUrl!: string;

  @Column({ name: 'check_title', type: 'varchar', length: 200 })
  checkTitle!: string;

  @Column({ name: 'state_before', type: 'varchar', length: 20, nullable: true })
  stateBefore!: string | null;

  @Column({ name: 'state_after', type: 'varchar', length: 20 })
  stateAfter!: string;

  @Column({ name: 'follow_label', type: 'varchar', length: 200 })
  followLabel!: string;

  @Column({ name: 'occurred_at', type: 'datetime', precision: 3 })
  occurredAt!: Date;

  @Column({ name: 'digest_key', type: 'varchar', length: 191, nullable: true })
  digestKey!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
