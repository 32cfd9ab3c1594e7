import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';

/** A signed-in browser. Only the SHA-256 of the cookie's token is kept, so a database leak signs nobody in. */
@Entity('sessions')
export class Session {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Index()
  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  @Column({ name: 'token_hash', type: 'char', length: 64, unique: true })
  tokenHash!: string;

  @Column({ name: 'expires_at', type: 'datetime', precision: 3 })
  expiresAt!: Date;

  @Column({ name: 'last_seen_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  lastSeenAt!: Date;

  @Column({ name: 'user_agent', type: 'varchar', length: 255, nullable: true })
  userAgent!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
