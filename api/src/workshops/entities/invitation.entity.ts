import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId } from '../../common/database/columns';
import { MEMBER_ROLES, type MemberRole } from '../../common/types/access-context';

/** An e-mailed offer to join a workshop; the link's token is stored only as its SHA-256. */
@Entity('invitations')
@Index(['workshopId', 'email'])
export class Invitation {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Column({ type: 'varchar', length: 254 })
  email!: string;

  @Column({ type: 'enum', enum: MEMBER_ROLES })
  role!: MemberRole;

  @Column({ name: 'token_hash', type: 'char', length: 64, unique: true })
  tokenHash!: string;

  @Column({ name: 'expires_at', type: 'datetime', precision: 3 })
  expiresAt!: Date;

  @Column({ name: 'accepted_at', type: 'datetime', precision: 3, nullable: true })
  acceptedAt!: Date | null;

  @Column({ name: 'accepted_by', type: 'char', length: 36, nullable: true })
  acceptedBy!: string | null;

  @Column({ name: 'invited_by', type: 'char', length: 36, nullable: true })
  invitedBy!: string | null;

  @CreatedAtColumn()
  createdAt!: Date;
}
