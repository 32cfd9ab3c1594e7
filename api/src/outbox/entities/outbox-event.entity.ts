import { Column, Entity, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

/** Something that happened and must reach people by mail, stored in the transaction of the change itself. */
@Entity('outbox_events')
export class OutboxEvent {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ type: 'varchar', length: 60 })
  kind!: string;

  /** JSON of the event, as the kind's expander reads it. */
  @Column({ type: 'longtext' })
  payload!: string;

  @CreatedAtColumn()
  createdAt!: Date;

  /** Set in the transaction that turned the event into deliveries. */
  @Column({ name: 'relayed_at', type: 'datetime', precision: 3, nullable: true })
  relayedAt!: Date | null;
}
