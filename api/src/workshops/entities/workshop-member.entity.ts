import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { newId } from '../../common/database/columns';
import { MEMBER_ROLES, type MemberRole } from '../../common/types/access-context';

/** A user's role in a workshop: `owner` manages members; `editor` does everything else. */
@Entity('workshop_members')
@Index(['workshopId', 'userId'], { unique: true })
export class WorkshopMember {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string = newId();

  @Column({ name: 'workshop_id', type: 'char', length: 36 })
  workshopId!: string;

  @Index()
  @Column({ name: 'user_id', type: 'char', length: 36 })
  userId!: string;

  @Column({ type: 'enum', enum: MEMBER_ROLES })
  role!: MemberRole;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt!: Date;

  @UpdateDateColumn({
    name: 'updated_at',
    type: 'datetime',
    precision: 3,
    default: () => 'CURRENT_TIMESTAMP(3)',
    onUpdate: 'CURRENT_TIMESTAMP(3)',
  })
  updatedAt!: Date;
}
