import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { CreatedAtColumn, newId, UpdatedAtColumn } from '../../common/database/columns';
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

  @CreatedAtColumn()
  createdAt!: Date;

  @UpdatedAtColumn()
  updatedAt!: Date;
}
